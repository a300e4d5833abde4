import Link from "next/link";

export const metadata = { title: "Payment cancelled" };

/** Back from the payment page without paying: nothing was charged and nothing changes. */
export default async function CheckoutCancel({ searchParams }: { searchParams: Promise<{ listing?: string | string[] }> }) {
  const raw = (await searchParams).listing;
  const slug = Array.isArray(raw) ? raw[0] : raw;
  const back = slug && /^[a-z0-9]+(-[a-z0-9]+)*$/.test(slug) ? `/store/${slug}` : "/store";
  return (
    <div className="panel mx-auto max-w-lg p-6" data-testid="checkout-cancelled">
      <h1 className="text-xl font-bold text-iron">No payment was made</h1>
      <p className="mt-2 text-sm text-iron-600">You left the payment page before paying, so nothing was charged. You can buy whenever you are ready.</p>
      <Link href={back} className="btn-quiet mt-4">Back to the programme</Link>
    </div>
  );
}
