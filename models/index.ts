import type { Sequelize } from 'sequelize';
import { AuditEvent } from './audit-event';
import { Circuit } from './circuit';
import { CircuitRules } from './circuit-rules';
import { CircuitRevision } from './circuit-revision';
import { Comment } from './comment';
import { FaultSearch } from './fault-search';
import { Invitation } from './invitation';
import { LogMapping } from './log-mapping';
import { Membership } from './membership';
import { PasswordResetToken } from './password-reset-token';
import { Proof } from './proof';
import { ReviewRequest } from './review-request';
import { ReviewRequestReviewer } from './review-request-reviewer';
import { Run } from './run';
import { Scenario } from './scenario';
import { Upload } from './upload';
import { User } from './user';
import { Workspace } from './workspace';

export { AuditEvent, Circuit, CircuitRevision, Comment, Invitation, Membership, PasswordResetToken, Run, Upload, User, Workspace };
export { ROLES, type Role } from './roles';
export { ReviewRequest, ReviewRequestReviewer };
export { REVIEW_STATES, type ReviewState } from './review-request';
export { CircuitRules, Proof, Scenario };
export { FaultSearch, LogMapping };

let initialised: Sequelize | undefined;

/** Initialises every model on one Sequelize instance and wires the associations. */
export function initModels(sequelize: Sequelize): void {
  if (initialised === sequelize) return;
  initialised = sequelize;
  for (const model of [User, Workspace, Membership, Circuit, CircuitRevision, Comment, Run, Upload, AuditEvent, Invitation, PasswordResetToken, ReviewRequest, ReviewRequestReviewer, CircuitRules, Scenario, Proof, LogMapping, FaultSearch]) {
    model.initModel(sequelize);
  }
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Workspace.hasMany(Membership, { foreignKey: 'workspaceId', as: 'memberships' });
  Membership.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Workspace.hasMany(Circuit, { foreignKey: 'workspaceId', as: 'circuits' });
  Circuit.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Circuit.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Circuit.hasMany(CircuitRevision, { foreignKey: 'circuitId', as: 'revisions' });
  Circuit.belongsTo(CircuitRevision, { foreignKey: 'currentRevisionId', as: 'currentRevision', constraints: false });
  CircuitRevision.belongsTo(Circuit, { foreignKey: 'circuitId', as: 'circuit' });
  CircuitRevision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Comment.belongsTo(Circuit, { foreignKey: 'circuitId', as: 'circuit' });
  Comment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Comment.belongsTo(User, { foreignKey: 'resolvedById', as: 'resolvedBy' });
  Comment.belongsTo(CircuitRevision, { foreignKey: 'revisionId', as: 'revision' });
  Run.belongsTo(CircuitRevision, { foreignKey: 'revisionId', as: 'revision' });
  Run.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Upload.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
  Invitation.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });
  ReviewRequest.belongsTo(Circuit, { foreignKey: 'circuitId', as: 'circuit' });
  ReviewRequest.belongsTo(CircuitRevision, { foreignKey: 'revisionId', as: 'revision' });
  ReviewRequest.belongsTo(User, { foreignKey: 'requestedById', as: 'requestedBy' });
  ReviewRequest.belongsTo(User, { foreignKey: 'decidedById', as: 'decidedBy' });
  ReviewRequestReviewer.belongsTo(User, { foreignKey: 'reviewerId', as: 'reviewer' });
  Scenario.belongsTo(Circuit, { foreignKey: 'circuitId', as: 'circuit' });
  Proof.belongsTo(CircuitRevision, { foreignKey: 'revisionId', as: 'revision' });
  Proof.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Proof.hasMany(Run, { foreignKey: 'proofId', as: 'counterexampleRuns' });
  Upload.belongsTo(Circuit, { foreignKey: 'circuitId', as: 'circuit' });
  LogMapping.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });
  FaultSearch.belongsTo(Upload, { foreignKey: 'uploadId', as: 'upload' });
  FaultSearch.belongsTo(CircuitRevision, { foreignKey: 'revisionId', as: 'revision' });
  FaultSearch.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
}
export { JOB_STATUSES, type JobStatus } from './job-status';
