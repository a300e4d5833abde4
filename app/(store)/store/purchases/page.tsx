import Link from "next/link";
import { EmptyState } from "@/components/EmptyState";
import { dayText, formatMoney } from "@/components/store/format";
import { getDb } from "@/db/client";
import { listMyPurchases } from "@/db/purchases";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Your purchases" };
export const dynamic = "force-dynamic";

/** The buyer's receipts, newest first, each leading to their copy while it stands. */
export default async function PurchasesPage() {
  const viewer = await pageViewer(["athlete"], "/store/purchases");
  const purchases = await listMyPurchases(getDb(), viewer);
  return (
    <>
      <div className="mb-6">
        <h1 className="text-2xl font-bold tracking-tight text-iron sm:text-3xl">Your purchases</h1>
        <p className="mt-1 text-sm text-iron-500">Receipts for the programmes you bought. Each receipt was also sent to {viewer.email}.</p>
      </div>
      {purchases.length === 0 ? (
        <EmptyState title="Nothing bought yet" action={<Link href="/store" className="btn-primary">Browse programmes</Link>}>
          Programmes you buy appear here with their receipts, ready to start with your own maxes.
        </EmptyState>
      ) : (
        <ul className="grid gap-3" data-testid="purchases">
          {purchases.map((p) => (
            <li key={p.purchaseId} className="panel flex flex-wrap items-center gap-4 p-4">
              <div className="min-w-0 flex-1">
                <p className="font-semibold text-iron">{p.title}</p>
                <p className="text-xs text-iron-400">
                  Receipt no. {p.number} · {dayText(p.paidAt)} · by {p.sellerName}
                </p>
              </div>
              <span className="font-mono font-semibold">{formatMoney(p.amountMinor, p.currency)}</span>
              {p.status === "refunded" ? (
                <span className="rounded bg-chalk-200 px-2 py-0.5 text-xs font-semibold text-iron-600">refunded {dayText(p.refundedAt)}</span>
              ) : (
                <span className="rounded bg-moss-100 px-2 py-0.5 text-xs font-semibold text-moss-700">paid</span>
              )}
              <Link href={`/store/purchases/${p.purchaseId}`} className="btn-quiet">{p.status === "paid" ? "Open your copy" : "Receipt"}</Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
