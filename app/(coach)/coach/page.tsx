import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { coachDashboard } from "@/db/dashboard";
import { listTemplates } from "@/db/templates";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Coach desk" };

const dayMonth = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });

/** The coach's start page: recent templates, and each athlete's week so far with anything that needs a look. */
export default async function CoachHome() {
  const viewer = await pageViewer(["coach"], "/coach");
  const db = getDb();
  const [templates, dashboard] = await Promise.all([listTemplates(db, viewer, { pageSize: 5 }), coachDashboard(db, viewer)]);
  const first = viewer.name.split(" ")[0] || "coach";
  const attention = dashboard.rows.filter((r) => r.flags.length > 0).length;
  return (
    <>
      <PageTitle
        title={`Good to see you, ${first}`}
        lead={`Your templates, your athletes and this week's training at a glance.${attention > 0 ? ` ${attention} athlete${attention === 1 ? "" : "s"} could use a look.` : ""}`}
      />
      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="tpl-h">
          <div className="mb-3 flex items-baseline justify-between">
            <h2 id="tpl-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">
              Templates · {templates.total}
            </h2>
            <Link href="/coach/templates/new" className="text-sm font-semibold text-ember-700 hover:underline">
              New template
            </Link>
          </div>
          {templates.items.length === 0 ? (
            <EmptyState title="No templates yet" action={<Link href="/coach/templates/new" className="btn-primary">Write your first template</Link>}>
              A template is a programme written once in Ironquill notation — blocks, days, lifts, sets × reps and effort. Start from a blank page or one of the samples.
            </EmptyState>
          ) : (
            <ul className="panel divide-y divide-chalk-200" data-testid="overview-templates">
              {templates.items.map((t) => (
                <li key={t.id}>
                  <Link href={`/coach/templates/${t.id}`} className="flex items-center justify-between gap-3 px-4 py-3 hover:bg-chalk-50">
                    <span className="font-medium text-iron">{t.title}</span>
                    <span className="shrink-0 text-sm text-iron-400">
                      {t.latestVersion ? `v${t.latestVersion.number}` : "draft"}
                      {t.visibility !== "private" ? ` · ${t.visibility === "link" ? "shared" : "listed"}` : ""}
                    </span>
                  </Link>
                </li>
              ))}
              {templates.total > templates.items.length ? (
                <li>
                  <Link href="/coach/templates" className="block px-4 py-3 text-sm font-semibold text-ember-700 hover:underline">
                    All {templates.total} templates
                  </Link>
                </li>
              ) : null}
            </ul>
          )}
        </section>
        <section aria-labelledby="ath-h">
          <div className="mb-3 flex items-baseline justify-between">
            <h2 id="ath-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">
              This week · from {dayMonth.format(new Date(`${dashboard.weekOf}T00:00:00Z`))}
            </h2>
            <Link href="/coach/dashboard" className="text-sm font-semibold text-ember-700 hover:underline">
              Who trained
            </Link>
          </div>
          {dashboard.rows.length === 0 ? (
            <EmptyState title="No athletes yet" action={<Link href="/coach/athletes" className="btn-quiet">Invite an athlete</Link>}>
              Invite athletes by e-mail, record their maxes and plates, then assign a template to give each of them dated sessions with their own loads.
            </EmptyState>
          ) : (
            <ul className="panel divide-y divide-chalk-200" data-testid="overview-athletes">
              {dashboard.rows.map((a) => (
                <li key={a.id}>
                  <Link href={`/coach/athletes/${a.id}`} className="flex items-center justify-between gap-3 px-4 py-3 hover:bg-chalk-50">
                    <span className="font-medium text-iron">{a.name}</span>
                    <span className="flex shrink-0 items-center gap-2 text-sm text-iron-500">
                      {a.thisWeek.planned > 0 ? `${a.thisWeek.logged} of ${a.thisWeek.planned} sessions` : "nothing planned"}
                      {a.flags.length > 0 ? <span className="rounded bg-ember-100 px-1.5 py-0.5 text-xs font-semibold text-ember-700">look</span> : null}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </>
  );
}
