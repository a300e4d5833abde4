import "server-only";
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { parseProgramme, type Programme } from "@/lib/notation/index";
import { DESCRIPTION_MAX, TAG_MAX, TAGS_MAX, TITLE_MAX } from "@/db/templateRules";

export type Sample = { name: string; title: string; description: string };

/** Sample names are file names without `.iq`: lower-case words and hyphens, nothing that could climb folders. */
export const SAMPLE_NAME = /^[a-z0-9][a-z0-9-]{0,63}$/;

function samplesDir(): string {
  return path.join(process.cwd(), "templates");
}

/** The comment lines at the top of a file, which describe the samples that have no `description:`. */
function leadingComment(source: string): string {
  const lines: string[] = [];
  for (const line of source.split("\n")) {
    const m = /^\s*#\s?(.*)$/.exec(line);
    if (!m) break;
    lines.push(m[1].trim());
  }
  return lines.join(" ").trim();
}

/** What a programme says about itself, cut to the template limits: title, description, tags. */
export function describeProgramme(programme: Programme, source: string, fallbackTitle: string) {
  const title = (programme.title ?? fallbackTitle).trim().slice(0, TITLE_MAX) || "Untitled programme";
  const description = (programme.meta.description ?? leadingComment(source)).slice(0, DESCRIPTION_MAX);
  const tags = (programme.meta.tags ?? "")
    .split(",")
    .map((t) => t.trim().toLowerCase())
    .filter((t) => t !== "" && t.length <= TAG_MAX)
    .slice(0, TAGS_MAX);
  return { title, description, tags };
}

/** Every sample in templates/, read at request time, by name. */
export async function listSamples(): Promise<Sample[]> {
  let files: string[];
  try {
    files = await readdir(samplesDir());
  } catch {
    return [];
  }
  const names = files.filter((f) => f.endsWith(".iq")).map((f) => f.slice(0, -3)).filter((n) => SAMPLE_NAME.test(n)).sort();
  return Promise.all(
    names.map(async (name) => {
      const source = await readFile(path.join(samplesDir(), `${name}.iq`), "utf8");
      const { title, description } = describeProgramme(parseProgramme(source).programme, source, name);
      return { name, title, description };
    }),
  );
}

/** A sample's source, or null when there is no sample of that name. */
export async function readSample(name: string): Promise<string | null> {
  if (!SAMPLE_NAME.test(name)) return null;
  const known = await listSamples();
  if (!known.some((s) => s.name === name)) return null;
  return readFile(path.join(samplesDir(), `${name}.iq`), "utf8");
}
