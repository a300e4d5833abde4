/**
 * `iq fmt FILE [--write]`: print the canonical form, or rewrite the file in place.
 *
 * @example
 * // npm run -s iq -- fmt templates/beginner-full-body.iq --write
 */
import { writeFile } from "node:fs/promises";
import { formatProgramme } from "../../lib/notation/index";
import { readSource } from "./check";

export async function run(args: string[]): Promise<number> {
  const write = args.includes("--write");
  const files = args.filter((a) => !a.startsWith("--"));
  if (files.length !== 1) {
    console.error("usage: iq fmt FILE [--write]");
    return 2;
  }
  const file = files[0];
  const source = await readSource(file);
  if (source === null) return 2;
  const formatted = formatProgramme(source);
  if (!write) {
    process.stdout.write(formatted);
    return 0;
  }
  if (formatted === source) return 0;
  try {
    await writeFile(file, formatted, "utf8");
  } catch {
    console.error(`${file}: cannot be written`);
    return 2;
  }
  return 0;
}
