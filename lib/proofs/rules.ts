import 'server-only';
import { ruleTemplates, ruleVocabulary } from '@/engine/proof/rules';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { bindRulesText } from '@/lib/proofs/bind-rules';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import type { PutRulesBody } from '@/lib/proofs/schemas';
import { Circuit, CircuitRules } from '@/models';

export interface RulesView {
  text: string;
  /** How many times the rules were saved; 0 before the first save. Send it back with the next save. */
  revision: number;
  /** Ready-made rules for the newest revision's drawing. */
  templates: ReturnType<typeof ruleTemplates>;
  /** The names a rule may use on the newest revision's drawing. */
  vocabulary: ReturnType<typeof ruleVocabulary>;
}

/** A circuit's rules text with the templates and vocabulary of its newest revision. */
export async function getRules({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<RulesView> {
  getSequelize();
  const { document } = await revisionWithDocument({ workspaceId, circuitId });
  const rules = await CircuitRules.findByPk(circuitId);
  return { text: rules?.text ?? '', revision: rules?.revision ?? 0, templates: ruleTemplates(document), vocabulary: ruleVocabulary(document) };
}

/**
 * Saves a circuit's rules text. It must bind to the newest revision's drawing (`invalid:text`
 * with every error otherwise), and the writer must have read the latest save (`conflict:rules`).
 */
export async function saveRules({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: PutRulesBody }): Promise<RulesView> {
  const sequelize = getSequelize();
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId });
  bindRulesText({ text: input.text, document, revisionNumber: revision.number, field: 'text' });
  const saved = await sequelize.transaction(async (transaction) => {
    // The circuit row serialises writers, including the first save, when no rules row exists yet to lock.
    await Circuit.findOne({ where: { id: circuitId, workspaceId: actor.workspaceId }, transaction, lock: transaction.LOCK.UPDATE });
    const current = await CircuitRules.findByPk(circuitId, { transaction });
    const currentRevision = current?.revision ?? 0;
    if (input.revision !== currentRevision) {
      throw new AppError('conflict', 'rules', `The rules were saved meanwhile (save ${currentRevision}, you had save ${input.revision}); load them and apply your change again`, 'revision');
    }
    const next = { circuitId, text: input.text, revision: currentRevision + 1, updatedById: actor.userId };
    if (current) await current.update(next, { transaction });
    else await CircuitRules.create(next, { transaction });
    await recordAudit({ action: 'rules.saved', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'circuit', targetId: circuitId, data: { revision: next.revision } }, transaction);
    return next;
  });
  return { text: saved.text, revision: saved.revision, templates: ruleTemplates(document), vocabulary: ruleVocabulary(document) };
}
