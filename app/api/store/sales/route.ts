import { getDb } from "@/db/client";
import { listSales } from "@/db/sales";
import { requireViewer } from "@/server/guard";
import { answer, ok } from "@/server/http";

/** The coach's sales (an admin: everyone's) with totals per month and currency, amounts in minor units. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "admin"]);
    return ok(await listSales(getDb(), viewer));
  });
}
