import { z } from "zod";

/** GET /api/exercises/names takes no parameters; any sent are ignored. */
export const namesQuerySchema = z.object({}).passthrough();
