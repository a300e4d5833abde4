import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { fileTests } from "@lezer/generator/test";
import { describe, expect, it } from "vitest";
import { parser } from "./index";

const dir = join(fileURLToPath(new URL(".", import.meta.url)), "test");

for (const file of readdirSync(dir).filter((f) => f.endsWith(".txt"))) {
  describe(`grammar: ${file}`, () => {
    for (const { name, run } of fileTests(readFileSync(join(dir, file), "utf8"), file)) it(name, () => run(parser));
  });
}

describe("highlighting props", () => {
  it("attach a style to keyword and number nodes", async () => {
    const { highlightTree, tagHighlighter, tags } = await import("@lezer/highlight");
    const src = "day Upper mon\n  bench press 3x5 @75%";
    const seen: string[] = [];
    const hl = tagHighlighter([
      { tag: tags.definitionKeyword, class: "kw" },
      { tag: tags.number, class: "num" },
    ]);
    highlightTree(parser.parse(src), hl, (from, to, cls) => seen.push(`${src.slice(from, to)}:${cls}`));
    expect(seen).toContain("day:kw");
    expect(seen).toContain("3x5:num");
  });
});
