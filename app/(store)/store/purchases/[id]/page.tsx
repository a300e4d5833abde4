import Link from "next/link";
import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { nextMonday } from "@/components/editor/sampleProfile";
import { dayText, formatMoney } from "@/components/store/format";
import { ListingPreview } from "@/components/store/ListingPreview";
import { MaxesForm } from "@/components/store/MaxesForm";
import { StartProgramme } from "@/components/store/StartProgramme";
import { listAssignments } from "@/db/assignments";
import { currentMaxes, expansionProfile, getEquipment } from "@/db/athleteProfiles";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { getMyPurchase } from "@/db/purchases";
import { exerciseKey } from "@/lib/exercises/resolve";
import type { Programme } from "@/lib/notation/model";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Your copy" };
export const dynamic = "force-dynamic";

/** Lifts whose loads come from a max (percentages or reps in reserve, no fixed weight), each once. */
function liftsNeedingMax(programme: Programme): string[] {
  const seen = new Map<string, string>();
  for (const block of programme.blocks)
    for (const day of block.days)
      for (const ex of day.exercises)
        if (ex.intensity && !ex.load) for (const name of ex.variations) if (!seen.has(exerciseKey(name))) seen.set(exerciseKey(name), name);
  return [...seen.values()];
}

export default async function PurchasePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["athlete"], `/store/purchases/${id}`);
  const db = getDb();
  const owned = await getMyPurchase(db, viewer, id).catch((err: unknown) => {
    if (err instanceof DomainError && err.code === "not_found") notFound();
    throw err;
  });
  const { receipt, copy } = owned;
  return (
    <>
      <div className="mb-6">
        <p className="text-xs font-semibold uppercase tracking-[0.14em] text-ember-600">Your copy</p>
        <h1 className="mt-1 text-2xl font-bold tracking-tight text-iron sm:text-3xl">{receipt.title}</h1>
        <p className="mt-1 text-sm text-iron-500">by {receipt.sellerName}</p>
      </div>
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <div className="min-w-0 space-y-6">{copy ? <CopySteps purchaseId={receipt.purchaseId} copy={copy} viewer={viewer} /> : <Withdrawn status={receipt.status} />}</div>
        <aside className="panel self-start p-4 text-sm" aria-labelledby="receipt-h" data-testid="receipt">
          <h2 id="receipt-h" className="mb-2 text-sm font-semibold uppercase tracking-wider text-iron-400">Receipt</h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="text-iron-400">No.</dt>
            <dd>{receipt.number}</dd>
            <dt className="text-iron-400">Date</dt>
            <dd>{dayText(receipt.paidAt)}</dd>
            <dt className="text-iron-400">Amount</dt>
            <dd className="font-mono font-semibold">{formatMoney(receipt.amountMinor, receipt.currency)}</dd>
            <dt className="text-iron-400">Status</dt>
            <dd>{receipt.status === "refunded" ? `refunded ${dayText(receipt.refundedAt)}` : receipt.status}</dd>
            <dt className="text-iron-400">Reference</dt>
            <dd className="break-all font-mono text-xs">{receipt.paymentReference ?? "—"}</dd>
          </dl>
          <Link href="/store/purchases" className="mt-4 inline-block font-semibold text-ember-600 hover:underline">All your purchases</Link>
        </aside>
      </div>
    </>
  );
}

function Withdrawn({ status }: { status: string }) {
  return (
    <div className="panel p-6">
      <h2 className="text-lg font-semibold text-iron">{status === "refunded" ? "This purchase was refunded" : "Waiting for the payment"}</h2>
      <p className="mt-2 text-sm text-iron-500">
        {status === "refunded"
          ? "The money went back to you and the copy was withdrawn. Sessions you already trained stay in your history."
          : "Your copy appears here as soon as the payment provider confirms the payment."}
      </p>
    </div>
  );
}

async function CopySteps({ purchaseId, copy, viewer }: { purchaseId: string; copy: { templateId: string; programme: Programme }; viewer: { id: string; name: string; role: "athlete" | "coach" | "admin" } }) {
  const db = getDb();
  const [equipment, maxes, profile, assignments] = await Promise.all([
    getEquipment(db, viewer.id),
    currentMaxes(db, viewer.id),
    expansionProfile(db, viewer.id, viewer.name),
    listAssignments(db, viewer, viewer.id),
  ]);
  const byKey = new Map(maxes.map((m) => [m.exerciseKey, m]));
  const rows = liftsNeedingMax(copy.programme).map((exercise) => {
    const m = byKey.get(exerciseKey(exercise));
    return { exercise, current: m && m.units === equipment.units ? m.value : null };
  });
  const running = assignments.find((a) => a.templateId === copy.templateId && a.status === "active");
  const untagged = Math.max(0, ...copy.programme.blocks.map((b) => b.days.filter((d) => d.weekday === null).length));
  return (
    <>
      <Step n={1} title="Your maxes">
        <MaxesForm athleteId={viewer.id} units={equipment.units} rows={rows} />
      </Step>
      <Step n={2} title="Week 1 with your loads">
        <ListingPreview programme={copy.programme} athlete={profile} lead={`Worked from the maxes on file, in ${equipment.units}, rounded to your plates.`} />
      </Step>
      <Step n={3} title="Start it">
        {running ? (
          <p className="text-sm text-moss-700" data-testid="programme-started">
            Running since {dayText(running.startDate)} · {running.sessions.upcoming} sessions to go. <Link href="/athlete" className="font-semibold underline">Today&apos;s training</Link>
          </p>
        ) : (
          <StartProgramme purchaseId={purchaseId} defaultStart={nextMonday()} untaggedDays={untagged} />
        )}
      </Step>
    </>
  );
}

function Step({ n, title, children }: { n: number; title: string; children: ReactNode }) {
  return (
    <section className="panel p-4" aria-labelledby={`step-${n}`}>
      <h2 id={`step-${n}`} className="mb-3 flex items-center gap-2 text-base font-semibold text-iron">
        <span className="flex h-6 w-6 items-center justify-center rounded-full bg-iron text-xs text-chalk">{n}</span>
        {title}
      </h2>
      {children}
    </section>
  );
}
