import type { ReactNode } from "react";
import type { Equipment, MaxesResponse } from "@/app/api/athletes/types";
import type { KnownName } from "@/lib/athlete/exerciseMatch";
import { CsvImport } from "./CsvImport";
import { EquipmentForm } from "./EquipmentForm";
import { MaxesPanel } from "./MaxesPanel";

/**
 * The athlete's gym, maxes and the CSV import, as the coach and the athlete
 * both see them. Needs a TanStack Query provider above it.
 */
export function ProfileSections({ athleteId, equipment, maxes, names }: { athleteId: string; equipment: Equipment; maxes: MaxesResponse; names: KnownName[] }) {
  return (
    <div className="space-y-6">
      <Section id="equipment" title="Gym and equipment" lead="Loads are rounded to this bar and these plates, in this unit.">
        <EquipmentForm athleteId={athleteId} initial={equipment} />
      </Section>
      <Section id="maxes" title="Maxes" lead="The latest measured max of each exercise is the one loads are worked from; earlier ones stay as history.">
        <MaxesPanel athleteId={athleteId} initial={maxes} names={names} />
      </Section>
      <Section id="import" title="Import maxes from CSV">
        <CsvImport athleteId={athleteId} />
      </Section>
    </div>
  );
}

function Section({ id, title, lead, children }: { id: string; title: string; lead?: string; children: ReactNode }) {
  return (
    <section className="panel p-4 sm:p-5" aria-labelledby={`${id}-h`}>
      <h2 id={`${id}-h`} className="text-lg font-semibold text-iron">{title}</h2>
      {lead ? <p className="mb-4 mt-1 text-sm text-iron-500">{lead}</p> : <div className="mb-4" />}
      {children}
    </section>
  );
}
