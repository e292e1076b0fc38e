import { z } from 'zod';
import { VARIATION_KINDS, type VariationKind } from '@/engine/proof/search';
import { inputEventSchema } from '@/engine/solver/inputs';
import { LIVE_RUN_HORIZON_S } from '@/lib/runs/live-run';

export const scenarioIdSchema = z.string().uuid('not a scenario id');
export const proofIdSchema = z.string().uuid('not a proof id');

/** Longest rules or expectations text: far more than any circuit's rules need. */
const RULES_TEXT_MAX = 100_000;

const rulesText = z
  .string()
  .max(RULES_TEXT_MAX, `at most ${RULES_TEXT_MAX} characters`)
  // PostgreSQL text cannot hold a NUL character.
  .refine((text) => !text.includes('\u0000'), 'contains a NUL character');

/** The save count the writer read; a stale one is a conflict, not an overwrite. */
const savedRevision = z.number().int('not a save count').min(0, 'not a save count');

export const putRulesBodySchema = z.object({ text: rulesText, revision: savedRevision }).strict();
export type PutRulesBody = z.infer<typeof putRulesBodySchema>;

const scenarioName = z.string().trim().min(1, 'give the scenario a name').max(120, 'at most 120 characters');
const scenarioInputs = z.array(inputEventSchema).max(10_000, 'at most 10 000 inputs');
const scenarioUntilS = z.number().positive('must be more than 0 s').max(LIVE_RUN_HORIZON_S, `at most ${LIVE_RUN_HORIZON_S} s`);

function inputsWithinRun(body: { inputs?: ReadonlyArray<{ t: number }>; untilS?: number }, ctx: z.RefinementCtx): void {
  if (!body.inputs || body.untilS === undefined) return;
  const late = body.inputs.findIndex((input) => input.t > body.untilS!);
  if (late >= 0) ctx.addIssue({ code: 'custom', path: ['inputs', late, 't'], message: `after the end of the scenario (${body.untilS} s)` });
}

export const createScenarioBodySchema = z
  .object({ name: scenarioName, inputs: scenarioInputs, untilS: scenarioUntilS, expectations: rulesText })
  .strict()
  .superRefine(inputsWithinRun);
export type CreateScenarioBody = z.infer<typeof createScenarioBodySchema>;

/** Only the fields given change; `revision` is the save count the writer read. */
export const updateScenarioBodySchema = z
  .object({ revision: savedRevision, name: scenarioName.optional(), inputs: scenarioInputs.optional(), untilS: scenarioUntilS.optional(), expectations: rulesText.optional() })
  .strict();
export type UpdateScenarioBody = z.infer<typeof updateScenarioBodySchema>;

/** An empty body runs the circuit's newest revision. */
export const runScenarioBodySchema = z.object({ revisionNumber: z.number().int().min(1, 'not a revision number').optional() }).strict().optional();

export const startProofBodySchema = z
  .object({
    revisionNumber: z.number().int().min(1, 'not a revision number'),
    rulesText: rulesText.refine((text) => text.trim().length > 0, 'write at least one rule'),
    variations: z
      .array(z.object({ tag: z.string().trim().min(1, 'name a tag').max(64), kind: z.enum(VARIATION_KINDS as [VariationKind, ...VariationKind[]], `one of ${VARIATION_KINDS.join(', ')}`) }).strict())
      .min(1, 'choose at least one variation')
      .max(16, 'at most 16 variations'),
    quantumS: z.number().min(0.05, 'at least 0.05 s').max(2, 'at most 2 s'),
    steps: z.number().int('a whole number').min(1, 'at least 1').max(12, 'at most 12'),
    settleS: z.number().min(0, 'at least 0 s').max(5, 'at most 5 s'),
  })
  .strict()
  .superRefine((body, ctx) => {
    const seen = new Set<string>();
    body.variations.forEach((v, i) => {
      const key = `${v.tag}\u0000${v.kind}`;
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['variations', i], message: `${v.tag} (${v.kind}) is listed twice` });
      seen.add(key);
    });
  });
export type StartProofBody = z.infer<typeof startProofBodySchema>;

export const listProofsQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListProofsQuery = z.infer<typeof listProofsQuerySchema>;
