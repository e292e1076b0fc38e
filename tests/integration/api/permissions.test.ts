import { randomUUID } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import type { NextRequest } from 'next/server';
import { beforeAll, describe, expect, it } from 'vitest';
import * as passwordResetConfirm from '@/app/api/account/password-reset/confirm/route';
import * as passwordResetRequest from '@/app/api/account/password-reset/request/route';
import * as signUp from '@/app/api/account/sign-up/route';
import * as circuitRevisions from '@/app/api/circuits/[id]/revisions/route';
import * as revisionOne from '@/app/api/circuits/[id]/revisions/[number]/route';
import * as revisionRestore from '@/app/api/circuits/[id]/revisions/[number]/restore/route';
import * as circuitCompare from '@/app/api/circuits/[id]/compare/route';
import * as circuitReviews from '@/app/api/circuits/[id]/reviews/route';
import * as reviews from '@/app/api/reviews/route';
import * as reviewDecision from '@/app/api/reviews/[id]/decision/route';
import * as reviewWithdraw from '@/app/api/reviews/[id]/withdraw/route';
import * as circuitOne from '@/app/api/circuits/[id]/route';
import * as circuits from '@/app/api/circuits/route';
import * as health from '@/app/api/health/route';
import * as invitationAccept from '@/app/api/invitations/accept/route';
import * as invitationLookup from '@/app/api/invitations/lookup/route';
import * as mailbox from '@/app/api/mailbox/route';
import * as invitationOne from '@/app/api/workspaces/current/invitations/[id]/route';
import * as invitationsRoute from '@/app/api/workspaces/current/invitations/route';
import * as memberOne from '@/app/api/workspaces/current/members/[userId]/route';
import * as members from '@/app/api/workspaces/current/members/route';
import * as current from '@/app/api/workspaces/current/route';
import * as workspaces from '@/app/api/workspaces/route';
import * as switchWorkspace from '@/app/api/workspaces/switch/route';
import * as circuitComments from '@/app/api/circuits/[id]/comments/route';
import * as circuitRuns from '@/app/api/circuits/[id]/runs/route';
import * as commentOne from '@/app/api/comments/[id]/route';
import * as commentReopen from '@/app/api/comments/[id]/reopen/route';
import * as commentResolve from '@/app/api/comments/[id]/resolve/route';
import * as runOne from '@/app/api/runs/[id]/route';
import * as runTrace from '@/app/api/runs/[id]/trace/route';
import * as circuitRules from '@/app/api/circuits/[id]/rules/route';
import * as circuitScenarios from '@/app/api/circuits/[id]/scenarios/route';
import * as scenarioSuite from '@/app/api/circuits/[id]/scenarios/run/route';
import * as scenarioOne from '@/app/api/scenarios/[id]/route';
import * as scenarioRun from '@/app/api/scenarios/[id]/run/route';
import * as circuitProofs from '@/app/api/circuits/[id]/proofs/route';
import * as proofOne from '@/app/api/proofs/[id]/route';
import * as proofCancel from '@/app/api/proofs/[id]/cancel/route';
import * as circuitLogs from '@/app/api/circuits/[id]/logs/route';
import * as circuitLogMappings from '@/app/api/circuits/[id]/log-mappings/route';
import * as logOne from '@/app/api/logs/[id]/route';
import * as logFile from '@/app/api/logs/[id]/file/route';
import * as logMapping from '@/app/api/logs/[id]/mapping/route';
import * as logReplay from '@/app/api/logs/[id]/replay/route';
import * as logReplays from '@/app/api/logs/[id]/replays/route';
import * as logFaultSearches from '@/app/api/logs/[id]/fault-searches/route';
import * as faultSearchOne from '@/app/api/fault-searches/[id]/route';
import * as faultSearchCancel from '@/app/api/fault-searches/[id]/cancel/route';
import { newToken } from '@/lib/auth/tokens';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { saveRun } from '@/lib/runs/save-run';
import { createLogUpload } from '@/lib/uploads/uploads';
import { Circuit, Comment, FaultSearch, Invitation, LogMapping, PasswordResetToken, Proof, ReviewRequest, ReviewRequestReviewer, Scenario } from '@/models';
import { lidPress } from '../call-route';
import { createRelayPress, DEMO_LOG, demoLogBytes } from '../replays/helpers';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';

/**
 * The role-permission table: every route handler, every kind of caller, the status
 * expected. Each cell runs against a fresh workspace so that writes don't interfere.
 * Later issues add their routes here; the coverage check below fails until they do.
 */
const ACTORS = ['signed_out', 'viewer', 'technician', 'reviewer', 'engineer', 'other_owner', 'owner'] as const;
type ActorKind = (typeof ACTORS)[number];

interface World {
  ws: TestWorkspace;
  other: TestWorkspace;
  circuitId: string;
  circuitLockVersion: number;
  invitationId: string;
  invitationToken: string;
  resetToken: string;
  /** Asked by the engineer, of the reviewer and the owner. */
  reviewId: string;
  /** An open thread the owner wrote. */
  commentId: string;
  resolvedCommentId: string;
  /** A saved run of revision 1. */
  runId: string;
  /** A scenario of the circuit at its first save. */
  scenarioId: string;
  /** The demo lid press, whose hand valves a proof can vary. */
  proofCircuitId: string;
  /** A queued proof of the lid press that no worker takes. */
  proofId: string;
  /** The relay-control lid press, with the demo log the technician uploaded and mapped. */
  logCircuitId: string;
  logId: string;
  /** A queued fault search of that log that no worker takes. */
  faultSearchId: string;
}

type Handler = (request: NextRequest, context: never) => Promise<Response>;

interface RouteCase {
  route: string;
  handler: Handler;
  path: (w: World) => string;
  body?: (w: World) => object;
  /** A raw body with its own headers (a field log), instead of JSON. */
  raw?: { body: string; headers: Record<string, string> };
  params?: (w: World) => Record<string, string>;
  expect: Record<ActorKind, number>;
}

const row = (...s: [number, number, number, number, number, number, number]): Record<ActorKind, number> =>
  Object.fromEntries(ACTORS.map((a, i) => [a, s[i]])) as Record<ActorKind, number>;
const fresh = () => `cell-${randomUUID().slice(0, 8)}@test.example`;

/** A proof of the lid press small enough to start in every cell. */
const CELL_PROOF = { revisionNumber: 1, rulesText: 'rule "stays in": never 1A1 is extending', variations: [{ tag: '1S1', kind: 'button' }], quantumS: 0.5, steps: 1, settleS: 0 };

//                                 signed_out viewer tech reviewer engineer other_owner owner
const TABLE: RouteCase[] = [
  { route: 'GET /api/health', handler: health.GET as Handler, path: () => '/api/health', expect: row(200, 200, 200, 200, 200, 200, 200) },
  { route: 'GET /api/circuits', handler: circuits.GET, path: () => '/api/circuits', expect: row(401, 200, 200, 200, 200, 200, 200) },
  { route: 'POST /api/circuits', handler: circuits.POST, path: () => '/api/circuits', body: () => ({ title: 'Table cell' }), expect: row(401, 403, 403, 403, 201, 201, 201) },
  { route: 'GET /api/circuits/[id]', handler: circuitOne.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/revisions', handler: circuitRevisions.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/revisions`, params: (w) => ({ id: w.circuitId }), body: (w) => ({ document: { schemaVersion: 1 }, message: 'Table cell', expectedLockVersion: w.circuitLockVersion }), expect: row(401, 403, 403, 403, 201, 404, 201) },
  { route: 'GET /api/workspaces', handler: workspaces.GET, path: () => '/api/workspaces', expect: row(401, 200, 200, 200, 200, 200, 200) },
  { route: 'POST /api/workspaces', handler: workspaces.POST, path: () => '/api/workspaces', body: () => ({ name: 'Cell workspace' }), expect: row(401, 201, 201, 201, 201, 201, 201) },
  { route: 'POST /api/workspaces/switch', handler: switchWorkspace.POST, path: () => '/api/workspaces/switch', body: (w) => ({ workspaceId: w.ws.workspaceId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/workspaces/current', handler: current.GET, path: () => '/api/workspaces/current', expect: row(401, 200, 200, 200, 200, 200, 200) },
  { route: 'GET /api/workspaces/current/members', handler: members.GET, path: () => '/api/workspaces/current/members', expect: row(401, 200, 200, 200, 200, 200, 200) },
  { route: 'PATCH /api/workspaces/current/members/[userId]', handler: memberOne.PATCH as Handler, path: (w) => `/api/workspaces/current/members/${w.ws.users.engineer.id}`, params: (w) => ({ userId: w.ws.users.engineer.id }), body: () => ({ role: 'reviewer' }), expect: row(401, 403, 403, 403, 403, 404, 200) },
  { route: 'DELETE /api/workspaces/current/members/[userId]', handler: memberOne.DELETE as Handler, path: (w) => `/api/workspaces/current/members/${w.ws.users.viewer.id}`, params: (w) => ({ userId: w.ws.users.viewer.id }), expect: row(401, 403, 403, 403, 403, 404, 200) },
  { route: 'GET /api/workspaces/current/invitations', handler: invitationsRoute.GET, path: () => '/api/workspaces/current/invitations', expect: row(401, 403, 403, 403, 403, 200, 200) },
  { route: 'POST /api/workspaces/current/invitations', handler: invitationsRoute.POST, path: () => '/api/workspaces/current/invitations', body: () => ({ email: fresh(), role: 'reviewer' }), expect: row(401, 403, 403, 403, 403, 201, 201) },
  { route: 'DELETE /api/workspaces/current/invitations/[id]', handler: invitationOne.DELETE as Handler, path: (w) => `/api/workspaces/current/invitations/${w.invitationId}`, params: (w) => ({ id: w.invitationId }), expect: row(401, 403, 403, 403, 403, 404, 200) },
  // Token-authorised: holding the e-mailed link is the permission.
  { route: 'GET /api/invitations/lookup', handler: invitationLookup.GET, path: (w) => `/api/invitations/lookup?token=${w.invitationToken}`, expect: row(200, 200, 200, 200, 200, 200, 200) },
  { route: 'POST /api/invitations/accept', handler: invitationAccept.POST, path: () => '/api/invitations/accept', body: (w) => ({ token: w.invitationToken, name: 'Cell Invitee', password: 'cell-invitee-pass' }), expect: row(200, 200, 200, 200, 200, 200, 200) },
  { route: 'POST /api/account/sign-up', handler: signUp.POST, path: () => '/api/account/sign-up', body: () => ({ name: 'Cell', email: fresh(), password: 'cell-signup-pass' }), expect: row(201, 201, 201, 201, 201, 201, 201) },
  { route: 'POST /api/account/password-reset/request', handler: passwordResetRequest.POST, path: () => '/api/account/password-reset/request', body: (w) => ({ email: w.ws.users.viewer.email }), expect: row(202, 202, 202, 202, 202, 202, 202) },
  { route: 'POST /api/account/password-reset/confirm', handler: passwordResetConfirm.POST, path: () => '/api/account/password-reset/confirm', body: (w) => ({ token: w.resetToken, password: 'cell-reset-pass-1' }), expect: row(200, 200, 200, 200, 200, 200, 200) },
  { route: 'GET /api/mailbox', handler: mailbox.GET, path: () => '/api/mailbox', expect: row(401, 403, 403, 403, 403, 200, 200) },
  { route: 'GET /api/circuits/[id]/revisions', handler: circuitRevisions.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/revisions`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/revisions/[number]', handler: revisionOne.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/revisions/1`, params: (w) => ({ id: w.circuitId, number: '1' }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/revisions/[number]/restore', handler: revisionRestore.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/revisions/1/restore`, params: (w) => ({ id: w.circuitId, number: '1' }), body: (w) => ({ expectedLockVersion: w.circuitLockVersion }), expect: row(401, 403, 403, 403, 201, 404, 201) },
  { route: 'GET /api/circuits/[id]/compare', handler: circuitCompare.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/compare?from=1&to=1`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/reviews', handler: circuitReviews.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/reviews`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/reviews', handler: circuitReviews.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/reviews`, params: (w) => ({ id: w.circuitId }), body: (w) => ({ revisionNumber: 1, reviewerIds: [w.ws.users.reviewer.id], message: 'Table cell' }), expect: row(401, 403, 403, 403, 201, 404, 201) },
  { route: 'GET /api/reviews', handler: reviews.GET, path: () => '/api/reviews?box=waiting', expect: row(401, 200, 200, 200, 200, 200, 200) },
  // Named reviewers and owners decide; the engineer asked, and asking is not deciding.
  { route: 'POST /api/reviews/[id]/decision', handler: reviewDecision.POST as Handler, path: (w) => `/api/reviews/${w.reviewId}/decision`, params: (w) => ({ id: w.reviewId }), body: () => ({ decision: 'approve' }), expect: row(401, 403, 403, 200, 403, 404, 200) },
  { route: 'POST /api/reviews/[id]/withdraw', handler: reviewWithdraw.POST as Handler, path: (w) => `/api/reviews/${w.reviewId}/withdraw`, params: (w) => ({ id: w.reviewId }), expect: row(401, 403, 403, 403, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/comments', handler: circuitComments.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/comments?revision=1`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/comments', handler: circuitComments.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/comments`, params: (w) => ({ id: w.circuitId }), body: () => ({ revisionNumber: 1, anchor: { kind: 'circuit' }, body: 'Table cell' }), expect: row(401, 403, 201, 201, 201, 404, 201) },
  // Only its author edits a comment, and the owner wrote this one.
  { route: 'PATCH /api/comments/[id]', handler: commentOne.PATCH as Handler, path: (w) => `/api/comments/${w.commentId}`, params: (w) => ({ id: w.commentId }), body: () => ({ body: 'Table cell, edited' }), expect: row(401, 403, 403, 403, 403, 404, 200) },
  { route: 'POST /api/comments/[id]/resolve', handler: commentResolve.POST as Handler, path: (w) => `/api/comments/${w.commentId}/resolve`, params: (w) => ({ id: w.commentId }), expect: row(401, 403, 200, 200, 200, 404, 200) },
  { route: 'POST /api/comments/[id]/reopen', handler: commentReopen.POST as Handler, path: (w) => `/api/comments/${w.resolvedCommentId}/reopen`, params: (w) => ({ id: w.resolvedCommentId }), expect: row(401, 403, 200, 200, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/runs', handler: circuitRuns.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/runs`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/runs', handler: circuitRuns.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/runs`, params: (w) => ({ id: w.circuitId }), body: () => ({ revisionNumber: 1, inputs: [], untilS: 1 }), expect: row(401, 403, 201, 201, 201, 404, 201) },
  { route: 'GET /api/runs/[id]', handler: runOne.GET as Handler, path: (w) => `/api/runs/${w.runId}`, params: (w) => ({ id: w.runId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/runs/[id]/trace', handler: runTrace.GET as Handler, path: (w) => `/api/runs/${w.runId}/trace`, params: (w) => ({ id: w.runId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/rules', handler: circuitRules.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/rules`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'PUT /api/circuits/[id]/rules', handler: circuitRules.PUT as Handler, path: (w) => `/api/circuits/${w.circuitId}/rules`, params: (w) => ({ id: w.circuitId }), body: () => ({ text: '# none yet', revision: 0 }), expect: row(401, 403, 403, 403, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/scenarios', handler: circuitScenarios.GET as Handler, path: (w) => `/api/circuits/${w.circuitId}/scenarios`, params: (w) => ({ id: w.circuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/scenarios', handler: circuitScenarios.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/scenarios`, params: (w) => ({ id: w.circuitId }), body: () => ({ name: 'Table cell', inputs: [], untilS: 1, expectations: '' }), expect: row(401, 403, 403, 403, 201, 404, 201) },
  { route: 'POST /api/circuits/[id]/scenarios/run', handler: scenarioSuite.POST as Handler, path: (w) => `/api/circuits/${w.circuitId}/scenarios/run`, params: (w) => ({ id: w.circuitId }), expect: row(401, 403, 200, 200, 200, 404, 200) },
  { route: 'PATCH /api/scenarios/[id]', handler: scenarioOne.PATCH as Handler, path: (w) => `/api/scenarios/${w.scenarioId}`, params: (w) => ({ id: w.scenarioId }), body: () => ({ revision: 1, name: 'Table cell, renamed' }), expect: row(401, 403, 403, 403, 200, 404, 200) },
  { route: 'DELETE /api/scenarios/[id]', handler: scenarioOne.DELETE as Handler, path: (w) => `/api/scenarios/${w.scenarioId}`, params: (w) => ({ id: w.scenarioId }), expect: row(401, 403, 403, 403, 200, 404, 200) },
  { route: 'POST /api/scenarios/[id]/run', handler: scenarioRun.POST as Handler, path: (w) => `/api/scenarios/${w.scenarioId}/run`, params: (w) => ({ id: w.scenarioId }), expect: row(401, 403, 201, 201, 201, 404, 201) },
  { route: 'GET /api/circuits/[id]/proofs', handler: circuitProofs.GET as Handler, path: (w) => `/api/circuits/${w.proofCircuitId}/proofs`, params: (w) => ({ id: w.proofCircuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/proofs', handler: circuitProofs.POST as Handler, path: (w) => `/api/circuits/${w.proofCircuitId}/proofs`, params: (w) => ({ id: w.proofCircuitId }), body: () => CELL_PROOF, expect: row(401, 403, 403, 202, 202, 404, 202) },
  { route: 'GET /api/proofs/[id]', handler: proofOne.GET as Handler, path: (w) => `/api/proofs/${w.proofId}`, params: (w) => ({ id: w.proofId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/circuits/[id]/logs', handler: circuitLogs.GET as Handler, path: (w) => `/api/circuits/${w.logCircuitId}/logs`, params: (w) => ({ id: w.logCircuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/circuits/[id]/logs', handler: circuitLogs.POST as Handler, path: (w) => `/api/circuits/${w.logCircuitId}/logs?name=cell.csv`, params: (w) => ({ id: w.logCircuitId }), raw: { body: 't;S1\n0;0\n', headers: { 'content-type': 'text/csv' } }, expect: row(401, 403, 201, 403, 201, 404, 201) },
  { route: 'GET /api/circuits/[id]/log-mappings', handler: circuitLogMappings.GET as Handler, path: (w) => `/api/circuits/${w.logCircuitId}/log-mappings`, params: (w) => ({ id: w.logCircuitId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/logs/[id]', handler: logOne.GET as Handler, path: (w) => `/api/logs/${w.logId}`, params: (w) => ({ id: w.logId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  // The technician uploaded it: its uploader and owners delete a log, not another engineer.
  { route: 'DELETE /api/logs/[id]', handler: logOne.DELETE as Handler, path: (w) => `/api/logs/${w.logId}`, params: (w) => ({ id: w.logId }), expect: row(401, 403, 200, 403, 403, 404, 200) },
  { route: 'GET /api/logs/[id]/file', handler: logFile.GET as Handler, path: (w) => `/api/logs/${w.logId}/file`, params: (w) => ({ id: w.logId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'PUT /api/logs/[id]/mapping', handler: logMapping.PUT as Handler, path: (w) => `/api/logs/${w.logId}/mapping`, params: (w) => ({ id: w.logId }), body: () => ({ name: 'Table cell', mapping: DEMO_LOG.mapping, revision: 1 }), expect: row(401, 403, 200, 200, 200, 404, 200) },
  { route: 'POST /api/logs/[id]/replay', handler: logReplay.POST as Handler, path: (w) => `/api/logs/${w.logId}/replay`, params: (w) => ({ id: w.logId }), expect: row(401, 403, 201, 201, 201, 404, 201) },
  { route: 'GET /api/logs/[id]/replays', handler: logReplays.GET as Handler, path: (w) => `/api/logs/${w.logId}/replays`, params: (w) => ({ id: w.logId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'GET /api/logs/[id]/fault-searches', handler: logFaultSearches.GET as Handler, path: (w) => `/api/logs/${w.logId}/fault-searches`, params: (w) => ({ id: w.logId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/logs/[id]/fault-searches', handler: logFaultSearches.POST as Handler, path: (w) => `/api/logs/${w.logId}/fault-searches`, params: (w) => ({ id: w.logId }), expect: row(401, 403, 202, 202, 202, 404, 202) },
  { route: 'GET /api/fault-searches/[id]', handler: faultSearchOne.GET as Handler, path: (w) => `/api/fault-searches/${w.faultSearchId}`, params: (w) => ({ id: w.faultSearchId }), expect: row(401, 200, 200, 200, 200, 404, 200) },
  { route: 'POST /api/fault-searches/[id]/cancel', handler: faultSearchCancel.POST as Handler, path: (w) => `/api/fault-searches/${w.faultSearchId}/cancel`, params: (w) => ({ id: w.faultSearchId }), expect: row(401, 403, 200, 200, 200, 404, 200) },
  { route: 'POST /api/proofs/[id]/cancel', handler: proofCancel.POST as Handler, path: (w) => `/api/proofs/${w.proofId}/cancel`, params: (w) => ({ id: w.proofId }), expect: row(401, 403, 403, 200, 200, 404, 200) },
];

/** Routes served by next-auth itself; they need Next's request scope, so e2e/auth-endpoints.spec.ts checks them. */
const COVERED_BY_E2E = ['GET /api/auth/[...nextauth]', 'POST /api/auth/[...nextauth]'];

async function makeWorld(): Promise<World> {
  const ws = await createTestWorkspace('perm');
  const other = await createTestWorkspace('perm-other');
  const circuit = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Permission target', description: '', message: '' } });
  const { lockVersion: circuitLockVersion } = await Circuit.findByPk(circuit.id, { rejectOnEmpty: true });
  const invitation = newToken();
  const inv = await Invitation.create({
    workspaceId: ws.workspaceId,
    email: fresh(),
    role: 'reviewer',
    tokenHash: invitation.hash,
    invitedById: ws.users.owner.id,
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  const reset = newToken();
  await PasswordResetToken.create({ userId: ws.users.technician.id, tokenHash: reset.hash, expiresAt: new Date(Date.now() + 3_600_000) });
  const review = await ReviewRequest.create({ circuitId: circuit.id, revisionId: circuit.revision.id, requestedById: ws.users.engineer.id, message: 'Check the clamp' });
  await ReviewRequestReviewer.bulkCreate([ws.users.reviewer.id, ws.users.owner.id].map((reviewerId) => ({ reviewRequestId: review.id, reviewerId })));
  const thread = { circuitId: circuit.id, revisionId: circuit.revision.id, parentId: null, anchor: { kind: 'circuit' as const }, editedAt: null };
  const comment = await Comment.create({ ...thread, authorId: ws.users.owner.id, body: 'Is 6 bar right for the clamp?', resolvedAt: null, resolvedById: null });
  const resolved = await Comment.create({ ...thread, authorId: ws.users.reviewer.id, body: 'Tube t2 looks long', resolvedAt: new Date(), resolvedById: ws.users.reviewer.id });
  const run = await saveRun({
    actor: { userId: ws.users.technician.id, workspaceId: ws.workspaceId, workspaceName: '', role: 'technician' },
    circuitId: circuit.id,
    input: { revisionNumber: 1, inputs: [], untilS: 1, name: null },
  });
  const scenario = await Scenario.create({ circuitId: circuit.id, name: 'Cell scenario', inputs: [], untilS: 1, expectations: '', createdById: ws.users.engineer.id, updatedById: ws.users.engineer.id });
  const press = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Proof target', description: '', message: '', document: lidPress().document } });
  const { rulesText, variations, quantumS, steps, settleS } = CELL_PROOF;
  const proof = await Proof.create({ revisionId: press.revision.id, rulesText, variations, quantumS, steps, settleS, createdById: ws.users.engineer.id, progress: null, result: null, error: null, startedAt: null, finishedAt: null });
  const logCircuitId = await createRelayPress(ws, 'Log target');
  const technician = { userId: ws.users.technician.id, workspaceId: ws.workspaceId, workspaceName: '', role: 'technician' as const };
  const log = await createLogUpload({
    actor: technician,
    circuitId: logCircuitId,
    fileName: DEMO_LOG.file,
    request: new Request('http://localhost/upload', { method: 'POST', headers: { 'content-type': 'text/csv' }, body: new Uint8Array(demoLogBytes()) }),
  });
  await LogMapping.create({ circuitId: logCircuitId, uploadId: log.id, name: 'Cell mapping', mapping: DEMO_LOG.mapping, columnsSignature: '0'.repeat(64), updatedById: ws.users.technician.id });
  const logRevision = await Circuit.findByPk(logCircuitId, { rejectOnEmpty: true });
  const faultSearch = await FaultSearch.create({ uploadId: log.id, revisionId: logRevision.currentRevisionId!, mapping: DEMO_LOG.mapping, createdById: ws.users.technician.id, progress: null, result: null, error: null, startedAt: null, finishedAt: null });
  return {
    ws,
    other,
    circuitId: circuit.id,
    circuitLockVersion,
    invitationId: inv.id,
    invitationToken: invitation.token,
    resetToken: reset.token,
    reviewId: review.id,
    commentId: comment.id,
    resolvedCommentId: resolved.id,
    runId: run.id,
    scenarioId: scenario.id,
    proofCircuitId: press.id,
    proofId: proof.id,
    logCircuitId,
    logId: log.id,
    faultSearchId: faultSearch.id,
  };
}

function userFor(kind: ActorKind, w: World): string | undefined {
  if (kind === 'signed_out') return undefined;
  if (kind === 'other_owner') return w.other.users.owner.id;
  return w.ws.users[kind].id;
}

function listRouteFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) return listRouteFiles(full);
    return entry === 'route.ts' ? [full] : [];
  });
}

describe('role-permission table', () => {
  it('lists every route handler that exists', () => {
    const apiDir = path.join(process.cwd(), 'app', 'api');
    const existing = listRouteFiles(apiDir).flatMap((file) => {
      const source = readFileSync(file, 'utf8');
      const route = `/api/${path.relative(apiDir, path.dirname(file)).split(path.sep).join('/')}`;
      const methods = [...source.matchAll(/export (?:const|async function) (GET|POST|PUT|PATCH|DELETE)\b/g), ...source.matchAll(/as (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1]);
      return methods.map((method) => `${method} ${route}`);
    });
    expect([...TABLE.map((c) => c.route), ...COVERED_BY_E2E].sort()).toEqual([...new Set(existing)].sort());
  });

  for (const routeCase of TABLE) {
    describe(routeCase.route, () => {
      for (const kind of ACTORS) {
        let world: World;
        beforeAll(async () => {
          world = await makeWorld();
        });
        it(`${kind} → ${routeCase.expect[kind]}`, async () => {
          const [method] = routeCase.route.split(' ');
          const request = await apiRequest(routeCase.path(world), { userId: userFor(kind, world), method, body: routeCase.raw?.body ?? routeCase.body?.(world), headers: routeCase.raw?.headers });
          const context = { params: Promise.resolve(routeCase.params?.(world) ?? {}) } as never;
          const response = await routeCase.handler(request, context);
          const text = await response.text();
          expect(response.status, text).toBe(routeCase.expect[kind]);
          if (response.status >= 400) expect(JSON.parse(text)).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
        });
      }
    });
  }
});
