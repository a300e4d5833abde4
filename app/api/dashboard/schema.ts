import { z } from "zod";

/** GET query: nothing needed; `today` (YYYY-MM-DD) is accepted for looking at another week. */
export const dashboardQuerySchema = z.object({
  today: z.iso.date({ error: "today: give a date as YYYY-MM-DD" }).optional(),
});
