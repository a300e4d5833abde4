import { z } from "zod";
import { isDateString } from "@/lib/dates/date";
import { WEEKDAYS } from "@/lib/notation/model";

export { idParamsSchema } from "../../../schema";

/** POST /api/store/purchases/[id]/start: when the buyer starts their copy, and on which days. */
export const startBodySchema = z.object({
  startDate: z.string({ error: "Give a start date, YYYY-MM-DD" }).refine(isDateString, "The start date is a calendar date written YYYY-MM-DD"),
  weekdays: z
    .array(z.enum(WEEKDAYS, { error: "Weekdays are mon, tue, wed, thu, fri, sat or sun" }), { error: "Weekdays are a list such as [\"mon\", \"thu\"]" })
    .max(7, "A week has seven days")
    .default([]),
});
