"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import type { CheckoutStatusResponse } from "@/app/api/store/types";
import { api, ApiFailure } from "@/components/templates/api";

// The provider's event usually lands within a second or two; after this long we stop asking and say so.
const GIVE_UP_AFTER_TRIES = 40;

/**
 * Back from the payment page: this only reads where the purchase stands. The
 * copy is granted by the provider's signed event, never by arriving here; once
 * it has been, the buyer is taken to their copy.
 */
export function CheckoutWaiter({ sessionId }: { sessionId: string }) {
  const router = useRouter();
  const [state, setState] = useState<{ kind: "waiting" | "paid" | "gone" | "slow" | "error"; message?: string; purchaseId?: string }>({ kind: "waiting" });

  useEffect(() => {
    let stopped = false;
    let tries = 0;
    async function look() {
      if (stopped) return;
      tries++;
      try {
        const s = await api<CheckoutStatusResponse>(`/api/store/checkout/status?session_id=${encodeURIComponent(sessionId)}`);
        if (s.status !== "pending") {
          setState({ kind: "paid", purchaseId: s.purchaseId });
          router.replace(`/store/purchases/${s.purchaseId}`);
          return;
        }
      } catch (e) {
        if (e instanceof ApiFailure && e.status === 404) return setState({ kind: "gone" });
        if (e instanceof ApiFailure && e.status === 401) return setState({ kind: "error", message: "Sign in again to see your purchase." });
      }
      if (tries >= GIVE_UP_AFTER_TRIES) return setState({ kind: "slow" });
      setTimeout(look, Math.min(500 * tries, 3000));
    }
    void look();
    return () => {
      stopped = true;
    };
  }, [sessionId, router]);

  if (state.kind === "paid") return <p role="status" className="text-moss-700">Payment confirmed. Opening your copy…</p>;
  if (state.kind === "gone") return <p role="alert" className="text-ember-700">We have no purchase of yours with this checkout. If you were charged, your receipt will arrive by e-mail; see <Link href="/store/purchases" className="font-semibold underline">your purchases</Link>.</p>;
  if (state.kind === "error") return <p role="alert" className="text-ember-700">{state.message}</p>;
  if (state.kind === "slow") {
    return (
      <p role="status" className="text-iron-600">
        The payment provider has not confirmed the payment yet. Nothing is lost: your copy appears under <Link href="/store/purchases" className="font-semibold text-ember-600 underline">your purchases</Link> as soon as it does, and the receipt comes by e-mail.
      </p>
    );
  }
  return (
    <p role="status" className="flex items-center gap-2 text-iron-600" data-testid="checkout-waiting">
      <span className="inline-block h-3 w-3 animate-spin rounded-full border-2 border-iron-300 border-t-ember" aria-hidden="true" />
      Waiting for the payment provider to confirm your payment…
    </p>
  );
}
