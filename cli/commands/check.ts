/**
 * `iq check FILE...`: print every diagnostic as `FILE:LINE:COL: severity: message`.
 * Exit 1 if any file has an error, 2 if a file cannot be read, 0 otherwise.
 *
 * @example
 * // npm run -s iq -- check templates/*.iq
 */
import { readFile } from "node:fs/promises";
import { parseProgramme } from "../../lib/notation/index";

export async function readSource(file: string): Promise<string | null> {
  try {
    return await readFile(file, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "is a directory" : code === "EACCES" ? "permission denied" : "cannot be read";
    console.error(`${file}: ${why}`);
    return null;
  }
}

export async function run(args: string[]): Promise<number> {
  const files = args.filter((a) => !a.startsWith("--"));
  if (files.length === 0) {
    console.error("usage: iq check FILE...");
    return 2;
  }
  let code = 0;
  for (const file of files) {
    const source = await readSource(file);
    if (source === null) {
      code = 2;
      continue;
    }
    const { diagnostics } = parseProgramme(source);
    for (const d of diagnostics) {
      console.log(`${file}:${d.line}:${d.column}: ${d.severity}: ${d.message}`);
      if (d.severity === "error" && code === 0) code = 1;
    }
  }
  return code;
}
