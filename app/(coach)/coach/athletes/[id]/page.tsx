import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { AssignmentList, AssignPanel } from "@/components/assignments";
import { maxesForClient } from "@/components/athletes/format";
import { ProfileSections } from "@/components/athletes/ProfileSections";
import { Caution } from "@/components/Caution";
import { EmailWeekPack } from "@/components/cards/EmailWeekPack";
import { WeekCardsDownload } from "@/components/cards/CardDownload";
import { todayUtc } from "@/db/recompute";
import { findAthleteFor } from "@/db/athleteAccess";
import { maxesView } from "@/db/athleteMaxes";
import { getEquipment } from "@/db/athleteProfiles";
import { getDb } from "@/db/client";
import { exerciseNamesFor } from "@/db/exercises";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Athlete" };

export default async function AthletePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/athletes/${id}`);
  const db = getDb();
  // Someone else's athlete looks exactly like a missing one.
  const athlete = await findAthleteFor(db, viewer, id);
  if (!athlete) notFound();
  const today = todayUtc();
  const [equipment, maxes, names] = await Promise.all([getEquipment(db, athlete.id), maxesView(db, viewer, athlete.id), exerciseNamesFor(db, { id: athlete.id, role: "athlete" })]);
  return (
    <>
      <Link href="/coach/athletes" className="mb-3 inline-block text-sm font-medium text-iron-500 hover:text-iron">
        ← All athletes
      </Link>
      <PageTitle
        title={athlete.name}
        lead={athlete.email}
        actions={
          <nav aria-label="This athlete" className="flex flex-wrap gap-2">
            <Link href={`/coach/athletes/${athlete.id}/calendar`} className="btn">
              Calendar
            </Link>
            <Link href={`/coach/athletes/${athlete.id}/log`} className="btn">
              Training log
            </Link>
          </nav>
        }
      />
      <section aria-labelledby="programmes-heading" className="mb-8 space-y-4">
        <h2 id="programmes-heading" className="text-lg font-semibold text-iron">
          Programmes
        </h2>
        <AssignmentList athleteId={athlete.id} />
        <AssignPanel athletes={[{ id: athlete.id, name: athlete.name }]} />
      </section>
      <section aria-labelledby="cards-heading" className="panel mb-8 space-y-3 p-4">
        <h2 id="cards-heading" className="text-lg font-semibold text-iron">
          Session cards
        </h2>
        <div className="flex flex-wrap items-start gap-3">
          <WeekCardsDownload athleteId={athlete.id} from={today} />
          <WeekCardsDownload athleteId={athlete.id} from={today} weeks={4} />
        </div>
        <EmailWeekPack athleteId={athlete.id} athleteName={athlete.name} from={today} />
      </section>
      <ProfileSections athleteId={athlete.id} equipment={equipment} maxes={maxesForClient(maxes)} names={names.map((n) => ({ name: n.name, exercise: n.exercise }))} />
      <Caution className="mt-6" />
    </>
  );
}
