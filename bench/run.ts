/**
 * `npm run bench`: runs every bench/*.bench.ts in turn. Each file prints its own
 * table of medians and targets. Speed targets live here, never in tests.
 */
import { readdirSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";
import { join } from "node:path";

const dir = fileURLToPath(new URL(".", import.meta.url));
const only = process.argv[2];
const files = readdirSync(dir)
  .filter((f) => f.endsWith(".bench.ts") && (!only || f.includes(only)))
  .sort();

for (const f of files) {
  console.log(`\n== ${f}`);
  const mod = await import(pathToFileURL(join(dir, f)).href);
  if (typeof mod.default === "function") await mod.default();
}
