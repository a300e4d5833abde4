import Link from "next/link";
import { CheckoutWaiter } from "@/components/store/CheckoutWaiter";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Payment received" };
export const dynamic = "force-dynamic";

/** Where the payment page sends the buyer back. It reads; the grant comes from the provider's signed event. */
export default async function CheckoutSuccess({ searchParams }: { searchParams: Promise<{ session_id?: string | string[] }> }) {
  const raw = (await searchParams).session_id;
  const sessionId = Array.isArray(raw) ? raw[0] : raw;
  await pageViewer(["athlete"], `/store/checkout/success${sessionId ? `?session_id=${encodeURIComponent(sessionId)}` : ""}`);
  return (
    <div className="panel mx-auto max-w-lg p-6">
      <h1 className="text-xl font-bold text-iron">Thank you</h1>
      <div className="mt-3">
        {sessionId && /^[\w-]{1,255}$/.test(sessionId) ? (
          <CheckoutWaiter sessionId={sessionId} />
        ) : (
          <p role="alert" className="text-ember-700">This address is missing its checkout reference (session_id). Your purchases are listed under <Link href="/store/purchases" className="font-semibold underline">your purchases</Link>.</p>
        )}
      </div>
    </div>
  );
}
