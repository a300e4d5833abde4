import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { SalesTable } from "@/components/store/SalesTable";
import { getDb } from "@/db/client";
import { listSales } from "@/db/sales";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Sales" };

export default async function SalesPage() {
  const viewer = await pageViewer(["coach"], "/coach/sales");
  const { rows, months } = await listSales(getDb(), viewer);
  const initial = { months, rows: rows.map((r) => ({ ...r, date: r.date.toISOString(), refundedAt: r.refundedAt?.toISOString() ?? null })) };
  return (
    <>
      <PageTitle
        title="Sales"
        lead="Templates you sold through the store. A refund returns the whole amount and withdraws the buyer's copy."
        actions={<Link href="/store" className="btn-quiet">See the store</Link>}
      />
      <SalesTable initial={initial} />
    </>
  );
}
