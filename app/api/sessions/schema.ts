import { z } from "zod";
import { isDateString } from "@/lib/dates";

/** A calendar day as the API takes it. */
export const dateSchema = (field: string) =>
  z.string({ error: `${field} is a date written YYYY-MM-DD` }).refine(isDateString, `${field} is a real calendar date written YYYY-MM-DD`);

/** Any text: an id that is not one of the viewer's athletes is simply not found. */
const idText = z.string().max(100, "That id is too long");

/** GET /api/sessions?athleteId=…&from=YYYY-MM-DD&to=YYYY-MM-DD (an athlete may leave out athleteId). */
export const listQuerySchema = z.object({
  athleteId: idText.optional(),
  from: dateSchema("from"),
  to: dateSchema("to"),
});
