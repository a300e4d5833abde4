import { Caution } from "@/components/Caution";
import { nextMonday, SAMPLE_MAXES_KG, sampleProfile } from "@/components/editor/sampleProfile";
import { WeekPreview } from "@/components/preview/WeekPreview";
import type { AthleteProfile } from "@/lib/athlete/profile";
import { expandProgramme } from "@/lib/load";
import type { Programme } from "@/lib/notation/model";

const LB_PER_KG = 1 / 0.45359237;

/** The sample athlete in the programme's own units: kg maxes as written, lb maxes converted and rounded to 5 lb. */
export function sampleAthleteFor(programme: Programme): AthleteProfile {
  if (programme.units === "kg") return sampleProfile("kg", SAMPLE_MAXES_KG);
  return sampleProfile("lb", Object.fromEntries(Object.entries(SAMPLE_MAXES_KG).map(([k, v]) => [k, Math.round((v * LB_PER_KG) / 5) * 5])));
}

/**
 * Week 1 of a version worked for an athlete (the sample one unless given), on
 * the server: a listing shows only its first week, so the rest of what is
 * sold never reaches the page.
 */
export function ListingPreview({ programme, athlete, lead }: { programme: Programme; athlete?: AthleteProfile; lead?: string }) {
  const profile = athlete ?? sampleAthleteFor(programme);
  const { sessions } = expandProgramme(programme, profile, { start: nextMonday(), weeks: 1 });
  const week1 = sessions.filter((s) => s.weekInProgramme === 1);
  return (
    <div className="space-y-3" data-testid="listing-preview">
      <p className="text-sm text-iron-500">{lead ?? `Week 1 worked for a sample athlete (${programme.units}). Your own maxes give your own loads.`}</p>
      <WeekPreview sessions={week1} />
      <Caution />
    </div>
  );
}
