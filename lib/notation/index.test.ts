import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { parseProgramme, parseTree, programmeSchema } from "./index";

const dir = join(fileURLToPath(new URL(".", import.meta.url)), "../../templates");
const templates = readdirSync(dir).filter((f) => f.endsWith(".iq"));

describe("templates", () => {
  it("there are at least four", () => {
    expect(templates.length).toBeGreaterThanOrEqual(4);
  });
  for (const f of templates) {
    it(`${f} checks clean and gives a model that passes the schema`, () => {
      const { programme, diagnostics } = parseProgramme(readFileSync(join(dir, f), "utf8"));
      expect(diagnostics).toEqual([]);
      expect(programmeSchema.parse(programme).blocks.length).toBeGreaterThan(0);
      expect(programme.blocks.every((b) => b.days.every((d) => d.exercises.length > 0))).toBe(true);
    });
  }
});

describe("public API", () => {
  it("parseTree returns the syntax tree with error nodes instead of throwing", () => {
    const tree = parseTree("day A\n  }{ 3x");
    let errors = 0;
    tree.iterate({ enter: (n) => void (n.type.isError && errors++) });
    expect(tree.length).toBe(13);
    expect(errors).toBeGreaterThan(0);
  });
  it("parseProgramme never throws on hostile input", () => {
    for (const src of ["\u0000", "\r\r\n", "x".repeat(5000), "{".repeat(300), '"'.repeat(99), "day\n".repeat(50)]) {
      expect(() => parseProgramme(src)).not.toThrow();
    }
  });
});
