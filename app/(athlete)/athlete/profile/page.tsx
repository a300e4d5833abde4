import { PageTitle } from "@/components/AppShell";
import { maxesForClient } from "@/components/athletes/format";
import { ProfileSections } from "@/components/athletes/ProfileSections";
import { Caution } from "@/components/Caution";
import { maxesView } from "@/db/athleteMaxes";
import { getEquipment } from "@/db/athleteProfiles";
import { getDb } from "@/db/client";
import { exerciseNamesFor } from "@/db/exercises";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Gym and maxes" };

export default async function AthleteProfilePage() {
  const viewer = await pageViewer(["athlete"], "/athlete/profile");
  const db = getDb();
  const [equipment, maxes, names] = await Promise.all([getEquipment(db, viewer.id), maxesView(db, viewer, viewer.id), exerciseNamesFor(db, viewer)]);
  return (
    <>
      <PageTitle title="Gym and maxes" lead="Your equipment and your maxes: every load in your sessions is worked from these. Your coach sees and can change the same." />
      {/* The panels use the query provider of the athlete layout. */}
      <ProfileSections athleteId={viewer.id} equipment={equipment} maxes={maxesForClient(maxes)} names={names.map((n) => ({ name: n.name, exercise: n.exercise }))} />
      <Caution className="mt-6" />
    </>
  );
}
