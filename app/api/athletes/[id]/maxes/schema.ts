import { z } from "zod";

export { athleteParamsSchema } from "../schema";

const text = (what: string) => z.string({ error: `${what} is text` });

/**
 * POST /api/athletes/[id]/maxes: one max, with the same fields as a line of the
 * CSV import. The value may be a number or text ("102,5" is read as 102.5);
 * the exercise, date and the rest are checked by lib/athlete/maxEntry.ts.
 */
export const maxBodySchema = z.object({
  exercise: text("exercise"),
  value: z.union([z.number(), z.string()], { error: "value is a number" }),
  unit: text("unit"),
  date: text("date"),
  kind: text("kind").optional(),
  source: text("source").optional(),
  note: text("note").nullable().optional(),
});
