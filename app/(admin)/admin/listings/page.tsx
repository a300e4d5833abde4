import { PageTitle } from "@/components/AppShell";
import { QueryProvider } from "@/components/QueryProvider";
import { AdminListings } from "@/components/store/AdminListings";
import { SalesTable } from "@/components/store/SalesTable";
import { getDb } from "@/db/client";
import { adminListListings } from "@/db/listings";
import { listSales } from "@/db/sales";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Listings" };

export default async function AdminListingsPage() {
  const viewer = await pageViewer(["admin"], "/admin/listings");
  const db = getDb();
  const [listings, sales] = await Promise.all([adminListListings(db, viewer), listSales(db, viewer)]);
  const initialSales = { months: sales.months, rows: sales.rows.map((r) => ({ ...r, date: r.date.toISOString(), refundedAt: r.refundedAt?.toISOString() ?? null })) };
  return (
    <>
      <PageTitle title="Store listings" lead="Every template coaches offer for sale. Unlisting takes one out of the store at once; buyers keep the copies they paid for." />
      <AdminListings initial={listings.map((l) => ({ ...l, updatedAt: l.updatedAt.toISOString() }))} />
      <h2 className="mb-3 mt-10 text-lg font-semibold text-iron">All purchases</h2>
      <QueryProvider>
        <SalesTable initial={initialSales} showSeller />
      </QueryProvider>
    </>
  );
}
