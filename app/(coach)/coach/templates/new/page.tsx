import { readFile } from "node:fs/promises";
import path from "node:path";
import { PageTitle } from "@/components/AppShell";
import { NewTemplate } from "@/components/templates/NewTemplate";
import { getDb } from "@/db/client";
import { libraryNamesFor } from "@/db/exercises";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "New template" };

const BLANK = `title: \nunits: kg\n\nblock Base 4w deload w4\nday Lower mon\n  back squat 3x5 @75% +2.5kg/wk\n`;

const SAMPLE_NAME = /^[a-z0-9-]+$/;

export default async function NewTemplatePage({ searchParams }: { searchParams: Promise<{ sample?: string }> }) {
  const viewer = await pageViewer(["coach"], "/coach/templates/new");
  const library = await libraryNamesFor(getDb(), viewer);
  const { sample } = await searchParams;
  let text = BLANK;
  let used: string | null = null;
  if (sample && SAMPLE_NAME.test(sample)) {
    text = await readFile(path.join(process.cwd(), "templates", `${sample}.iq`), "utf8").catch(() => BLANK);
    used = text === BLANK ? null : sample;
  }
  return (
    <>
      <PageTitle title="New template" lead="Type the programme on the left; the right shows exactly what an athlete gets. Ctrl/Cmd+S saves, Shift+Alt+F tidies." />
      <NewTemplate initialText={text} sample={used} library={library} />
    </>
  );
}
