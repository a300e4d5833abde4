import { readFile } from "node:fs/promises";
import path from "node:path";
import Link from "next/link";
import { marked } from "marked";
import { Nameplate } from "@/components/Nameplate";

export const metadata = { title: "The .iq notation" };

// The reference lives in docs/notation.md beside the code it describes; the page
// renders that one file, read once at build time, so the two never drift apart.
export const dynamic = "force-static";

export default async function NotationDocs() {
  const source = await readFile(path.join(process.cwd(), "docs", "notation.md"), "utf8");
  const html = await marked.parse(source, { gfm: true });
  return (
    <div className="min-h-dvh">
      <header className="border-b border-chalk-300 bg-white">
        <div className="mx-auto flex max-w-4xl items-center justify-between px-4 py-3">
          <Link href="/" aria-label="Ironquill home">
            <Nameplate subtitle="notation reference" />
          </Link>
          <Link href="/dashboard" className="text-sm font-semibold text-ember-600 hover:underline">
            Back to Ironquill
          </Link>
        </div>
      </header>
      <article className="iq-prose mx-auto max-w-4xl px-4 py-8" dangerouslySetInnerHTML={{ __html: html }} />
    </div>
  );
}
