import { getDb } from "@/db/client";
import { type CatalogueFilters, listCatalogue } from "@/db/catalogue";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { catalogueQuerySchema } from "./schema";

/** Public: listings on sale. ?q= (title, description or tag), ?tag=, ?weeks=1-4|5-8|9-12|13+, ?days=1..7, ?level=, ?page=. */
export async function GET(req: Request) {
  return answer(async () => {
    const query = parseWith(catalogueQuerySchema, queryOf(req));
    return ok(await listCatalogue(getDb(), query as CatalogueFilters));
  });
}
