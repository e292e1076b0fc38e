import { z } from 'zod';

/** Timed inputs as stored in scenarios and given to the CLI: JSON array of events. */
export const inputEventSchema = z.object({
  t: z.number().nonnegative(),
  component: z.string().min(1),
  action: z.enum(['press', 'release', 'toggle', 'set']),
  parameter: z.string().optional(),
  value: z.number().finite().optional(),
});

export const inputEventsSchema = z.array(inputEventSchema).max(100_000);
