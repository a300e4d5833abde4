import { notFound } from "next/navigation";
import { LogSession } from "@/components/logging/LogSession";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { getLogSheet } from "@/db/logs";
import { sessionSummary } from "@/db/progress";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Log session" };

/** The athlete logs a session set by set; a finished one opens on its summary (`?edit` goes back to the sets). */
export default async function LogSessionPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ edit?: string }> }) {
  const { id } = await params;
  const { edit } = await searchParams;
  const viewer = await pageViewer(["athlete"], `/athlete/sessions/${id}/log`);
  const db = getDb();
  const sheet = await getLogSheet(db, viewer, id).catch((e: unknown) => {
    if (e instanceof DomainError && e.code === "not_found") notFound();
    throw e;
  });
  const summary = sheet.session.completedAt && edit === undefined ? await sessionSummary(db, viewer, id) : null;
  return <LogSession key={id} initial={sheet} initialSummary={summary} historyHref="/athlete/history" />;
}
