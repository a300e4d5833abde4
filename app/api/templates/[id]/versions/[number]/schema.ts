import { z } from "zod";

export const versionParamsSchema = z.object({
  id: z.string().max(100),
  number: z.union([z.literal("latest"), z.string().regex(/^[1-9]\d{0,8}$/).transform(Number)], {
    error: "number is a version number (1, 2, …) or latest",
  }),
});

/** ?format=iq downloads the source as a .iq file; the default is JSON. */
export const versionQuerySchema = z.object({
  format: z.enum(["json", "iq"], { error: "format is json or iq" }).optional(),
});
