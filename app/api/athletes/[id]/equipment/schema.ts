import { equipmentSchema } from "@/lib/athlete/equipment";

export { athleteParamsSchema } from "../schema";

/**
 * PUT /api/athletes/[id]/equipment: the whole equipment, e.g.
 * `{ "units": "kg", "bodyweight": 82.5, "bar": 20, "plates": [25, 20, 10, 5, 2.5, 1.25], "dumbbellStep": 2, "machineStep": 5 }`;
 * plates may instead be `[{ "weight": 20, "pairs": 3 }, …]` when the gym has only so many.
 */
export const equipmentBodySchema = equipmentSchema;
