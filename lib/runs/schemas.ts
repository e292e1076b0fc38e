import { z } from 'zod';
import { inputEventSchema } from '@/engine/solver/inputs';
import { LIVE_RUN_HORIZON_S } from '@/lib/runs/live-run';

export const runIdSchema = z.string().uuid('not a run id');

export const saveRunBodySchema = z
  .object({
    revisionNumber: z.number().int().min(1, 'not a revision number'),
    inputs: z.array(inputEventSchema).max(10_000, 'at most 10 000 inputs'),
    untilS: z.number().positive('must be more than 0 s').max(LIVE_RUN_HORIZON_S, `at most ${LIVE_RUN_HORIZON_S} s`),
    name: z
      .string()
      .trim()
      .max(120, 'at most 120 characters')
      .optional()
      .transform((name) => name || null),
  })
  .strict()
  .superRefine((body, ctx) => {
    const late = body.inputs.findIndex((input) => input.t > body.untilS);
    if (late >= 0) ctx.addIssue({ code: 'custom', path: ['inputs', late, 't'], message: `after the end of the run (${body.untilS} s)` });
  });
export type SaveRunBody = z.infer<typeof saveRunBodySchema>;
