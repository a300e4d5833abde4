import { z } from "zod";

/** Route params of /api/admin/accounts/[id]: any text; an id that names nothing is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** PATCH /api/admin/accounts/[id]: disable or enable the account, change its role, or both. */
export const accountChangeSchema = z
  .object({
    disabled: z.boolean({ error: "disabled is true or false" }).optional(),
    role: z.enum(["admin", "coach", "athlete"], { error: "role is admin, coach or athlete" }).optional(),
  })
  .strict()
  .refine((v) => v.disabled !== undefined || v.role !== undefined, { error: "Say what to change: disabled, role, or both" });
