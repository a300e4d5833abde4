"use client";
import { signIn } from "next-auth/react";
import Link from "next/link";
import { useMemo, useState } from "react";
import type { CheckoutResponse } from "@/app/api/store/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";

type Props = {
  listingId: string;
  slug: string;
  price: string;
  viewerRole: "admin" | "coach" | "athlete" | null;
  /** The buyer's standing purchase of this programme, when they have one. */
  ownedPurchaseId: string | null;
  onSale: boolean;
};

/**
 * Buying: a signed-in athlete goes straight to the payment page; a visitor
 * makes an athlete account in the same panel (then is signed in) and goes on.
 * One attempt id per page view, so a double click starts one checkout.
 */
export function BuyPanel({ listingId, slug, price, viewerRole, ownedPurchaseId, onSale }: Props) {
  const attemptId = useMemo(() => crypto.randomUUID(), []);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});

  if (!onSale) return <p className="rounded-md bg-chalk-200 px-3 py-2 text-sm text-iron-600">This programme is not on sale at the moment.</p>;
  if (ownedPurchaseId) {
    return (
      <div className="space-y-2">
        <p className="text-sm text-moss-700">You own this programme.</p>
        <Link href={`/store/purchases/${ownedPurchaseId}`} className="btn-primary w-full">Open your copy</Link>
      </div>
    );
  }
  if (viewerRole === "coach" || viewerRole === "admin") {
    return <p className="rounded-md bg-chalk-200 px-3 py-2 text-sm text-iron-600">Programmes are bought with an athlete account. Sign out and sign in as an athlete to buy.</p>;
  }

  async function checkout() {
    const { url } = await api<CheckoutResponse>("/api/store/checkout", { method: "POST", json: { listingId, attemptId } });
    window.location.assign(url);
  }

  async function buy() {
    setBusy(true);
    setError(null);
    try {
      await checkout();
    } catch (e) {
      setError(describeFailure(e));
      setBusy(false);
    }
  }

  async function signUpAndBuy(form: FormData) {
    setBusy(true);
    setError(null);
    setFields({});
    const body = { name: String(form.get("name") ?? ""), email: String(form.get("email") ?? ""), password: String(form.get("password") ?? "") };
    try {
      await api("/api/store/account", { method: "POST", json: body });
      const res = await signIn("credentials", { email: body.email, password: body.password, redirect: false });
      if (!res || res.error) throw new Error("Your account was made, but signing in failed. Sign in and buy again.");
      await checkout();
    } catch (e) {
      if (e instanceof ApiFailure) setFields(e.error.fields);
      setError(e instanceof ApiFailure ? e.error.message : e instanceof Error ? e.message : describeFailure(e));
      setBusy(false);
    }
  }

  if (viewerRole === "athlete") {
    return (
      <div className="space-y-2">
        <button type="button" className="btn-primary w-full text-base" onClick={buy} disabled={busy}>{busy ? "Opening the payment page…" : `Buy for ${price}`}</button>
        {error ? <p role="alert" className="field-error">{error}</p> : null}
        <p className="text-xs text-iron-400">You pay on our payment provider&apos;s page and come back here. Your copy appears once the payment is confirmed.</p>
      </div>
    );
  }

  return (
    <form
      noValidate
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        void signUpAndBuy(new FormData(e.currentTarget));
      }}
    >
      <p className="text-sm text-iron-600">Make an account to buy — you will coach yourself with this programme, using your own maxes.</p>
      <Field id="name" label="Your name" autoComplete="name" error={fields.name} />
      <Field id="email" label="E-mail" type="email" autoComplete="email" error={fields.email} />
      <Field id="password" label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." error={fields.password} />
      {error ? <p role="alert" className="rounded-md bg-ember-50 px-3 py-2 text-sm text-ember-700">{error}</p> : null}
      <button type="submit" className="btn-primary w-full text-base" disabled={busy}>{busy ? "Opening the payment page…" : `Create account and buy for ${price}`}</button>
      <p className="text-center text-sm text-iron-500">
        Already have an account? <Link href={`/signin?callbackUrl=${encodeURIComponent(`/store/${slug}`)}`} className="font-semibold text-ember-600 hover:underline">Sign in</Link>
      </p>
    </form>
  );
}

function Field(props: { id: string; label: string; type?: string; autoComplete: string; error?: string; hint?: string }) {
  const id = `buy-${props.id}`;
  const describedBy = props.error ? `${id}-error` : props.hint ? `${id}-hint` : undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">{props.label}</label>
      <input id={id} name={props.id} type={props.type ?? "text"} autoComplete={props.autoComplete} aria-invalid={props.error ? true : undefined} aria-describedby={describedBy} className="field-input" />
      {props.error ? <p id={`${id}-error`} className="field-error">{props.error}</p> : props.hint ? <p id={`${id}-hint`} className="mt-1 text-xs text-iron-400">{props.hint}</p> : null}
    </div>
  );
}
