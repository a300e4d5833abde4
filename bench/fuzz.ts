/**
 * `npm run fuzz`: at least 100,000 generated and mutated programmes through the
 * parser and the formatter, checking the same invariants as the property tests.
 * Exits 1 with the first counterexample (shrunk) if any invariant breaks.
 */
import fc from "fast-check";
import { checkInvariants, mutatedText, programmeText } from "../lib/notation/fuzz-cases";

const runs = Number(process.env.FUZZ_RUNS ?? 40_000);
const holds = (src: string): void => {
  const problem = checkInvariants(src);
  if (problem) throw new Error(problem);
};
const suites: [string, fc.Arbitrary<string>, number][] = [
  ["generated programmes", programmeText(), runs],
  ["mutated programmes", mutatedText(), runs],
  ["arbitrary text", fc.string({ unit: "binary", maxLength: 300 }), Math.ceil(runs / 2)],
];

let total = 0;
const started = performance.now();
for (const [name, arb, numRuns] of suites) {
  const t0 = performance.now();
  try {
    fc.assert(fc.property(arb, holds), { numRuns });
  } catch (e) {
    console.error(`fuzz: ${name} failed\n${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  }
  total += numRuns;
  console.log(`${name.padEnd(22)} ${String(numRuns).padStart(7)} cases  ${((performance.now() - t0) / 1000).toFixed(1)} s`);
}
console.log(`all invariants held for ${total} cases in ${((performance.now() - started) / 1000).toFixed(1)} s`);
