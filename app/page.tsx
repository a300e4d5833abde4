import Link from "next/link";
import { Caution } from "@/components/Caution";
import { Nameplate } from "@/components/Nameplate";
import { num, platesText, repsText } from "@/components/preview/format";
import { expandProgramme } from "@/lib/load";
import { parseProgramme } from "@/lib/notation";

export const metadata = { title: { absolute: "Ironquill — programmes written as text, loads worked for every athlete" } };

const SAMPLE = `title: Winter strength
units: kg
block Build 4w deload w4
day Upper mon
  A1 bench press 4x5-7 @2rir ramp 50/70/85%
  A2 chin-up 3x6-10 bw "full hang"
  cable row 3x12 @1rir or machine row`;

// The card beside the sample is worked by the real engine, so it can never disagree with it.
const WORKED = (() => {
  const { programme } = parseProgramme(SAMPLE);
  const athlete = { name: "Tomas", units: "kg" as const, bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25], dumbbellStep: 2, machineStep: 5, maxes: { "bench press": 100 } };
  const session = expandProgramme(programme, athlete, { start: "2027-01-04", weeks: 1 }).sessions[0];
  const bench = session?.exercises[0];
  return {
    date: session?.date ?? "",
    isoWeek: session?.isoWeek ?? "",
    rows: (bench?.sets ?? [])
      .filter((set, i, all) => set.kind === "warmup" || all.findIndex((x) => x.kind === "work") === i)
      .map((set) => ({
        kind: set.kind,
        what: set.kind === "warmup" ? `${set.repsMin} rep${set.repsMin === 1 ? "" : "s"}` : `${bench?.sets.filter((x) => x.kind === "work").length} × ${repsText(set)} · ${set.rir} in reserve`,
        load: set.load === null ? "—" : num(set.load),
        plates: platesText(set),
      })),
  };
})();

export default function Landing() {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="mx-auto flex w-full max-w-6xl items-center justify-between px-4 py-4">
        <Nameplate />
        <nav className="flex items-center gap-2">
          <Link href="/store" className="rounded-md px-3 py-2 text-sm font-semibold text-iron-700 hover:bg-chalk-200">Programme store</Link>
          <Link href="/signin" className="rounded-md px-3 py-2 text-sm font-semibold text-iron-700 hover:bg-chalk-200">Sign in</Link>
          <Link href="/signup" className="btn-primary hidden sm:inline-flex">Start as a coach</Link>
        </nav>
      </header>

      <main className="flex-1">
        <section className="mx-auto grid max-w-6xl gap-10 px-4 pb-12 pt-6 sm:pt-12 lg:grid-cols-[1.05fr_1fr] lg:items-center">
          <div>
            <p className="text-xs font-semibold uppercase tracking-[0.16em] text-ember-600">For strength coaches</p>
            <h1 className="mt-3 text-4xl font-bold leading-[1.08] tracking-tight text-iron sm:text-5xl">
              Write the programme once. Every athlete lifts their own numbers.
            </h1>
            <p className="mt-5 max-w-xl text-base leading-relaxed text-iron-600 sm:text-lg">
              Ironquill is for coaches who write training programmes for people they train in the gym and online. Type a block in a compact text notation; Ironquill works it out for each athlete — loads from their own maxes, rounded to the plates in their gym, warm-ups ramped to the working weight — and puts it on a card they carry to the bar.
            </p>
            <div className="mt-7 flex flex-wrap gap-3">
              <Link href="/signup" className="btn-primary px-5 py-3 text-base">Create a coach account</Link>
              <Link href="/signin" className="btn-quiet px-5 py-3 text-base">Sign in</Link>
            </div>
          </div>

          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-1">
            <figure className="overflow-hidden rounded-xl bg-iron text-chalk shadow-lg">
              <figcaption className="border-b border-iron-700 px-4 py-2 text-[11px] font-semibold uppercase tracking-[0.14em] text-iron-300">You write · winter.iq</figcaption>
              <pre className="overflow-x-auto px-4 py-4 font-mono text-[12.5px] leading-6">
                <code>{SAMPLE}</code>
              </pre>
            </figure>
            <figure className="panel overflow-hidden">
              <figcaption className="flex items-baseline justify-between border-b border-chalk-200 px-4 py-2">
                <span className="text-[11px] font-semibold uppercase tracking-[0.14em] text-iron-400">Tomas lifts · Mon 4 Jan</span>
                <span className="font-mono text-[11px] text-iron-400">{WORKED.isoWeek}</span>
              </figcaption>
              <div className="px-4 py-3">
                <p className="font-semibold">A1 · Bench press</p>
                <table className="mt-2 w-full text-sm">
                  <thead className="text-left text-[11px] uppercase tracking-wider text-iron-400">
                    <tr>
                      <th className="py-1 font-semibold">Set</th>
                      <th className="py-1 text-right font-semibold">kg</th>
                      <th className="py-1 pl-3 text-right font-semibold">Per side</th>
                    </tr>
                  </thead>
                  <tbody className="font-mono">
                    {WORKED.rows.map((r, i) => (
                      <tr key={i} className={r.kind === "work" ? "border-t border-chalk-200 font-bold text-iron" : "text-iron-500"}>
                        <td className="py-1.5 font-sans">{r.what}</td>
                        <td className="py-1.5 text-right">{r.load}</td>
                        <td className="py-1.5 pl-3 text-right">{r.plates}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                <p className="mt-3 text-xs text-iron-400">From a 100 kg 1RM · 20 kg bar · change plates to 1.25 kg</p>
              </div>
            </figure>
          </div>
        </section>

        <section className="border-y border-chalk-300 bg-white">
          <div className="mx-auto grid max-w-6xl gap-8 px-4 py-12 sm:grid-cols-3">
            <Feature title="Programmes as text">
              Sets × reps, % of 1RM or reps in reserve, ramps, pauses, tempo, rotations every few weeks, substitutes for a busy machine, deload weeks — one line per lift, fast to type even on a phone.
            </Feature>
            <Feature title="Each athlete's own loads">
              Maxes in kg or lb, the bar and plates their gym really has, dumbbell and machine steps. Ironquill rounds to what can be loaded and lists the plates per side.
            </Feature>
            <Feature title="From card to conversation">
              Athletes see today&apos;s session and log sets between them, or print a card. You see who trained and how it went, adjust maxes, and sell your best templates.
            </Feature>
          </div>
        </section>
      </main>

      <footer className="mx-auto w-full max-w-6xl px-4 py-8">
        <Caution />
        <p className="mt-4 text-xs text-iron-400">Ironquill · a tool for coaches; it does not replace one.</p>
      </footer>
    </div>
  );
}

function Feature({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div>
      <h2 className="text-base font-semibold text-iron">{title}</h2>
      <p className="mt-2 text-sm leading-relaxed text-iron-500">{children}</p>
    </div>
  );
}
