/**
 * JSON shapes of the athlete profile API, for the pages that call it. Types
 * only, taken from the query modules and lib/athlete. Dates measured are
 * "YYYY-MM-DD"; entry times are ISO 8601 strings. Failures are the shared
 * `ApiError` (app/api/templates/types.ts).
 */
import type { MaxEntry as StoredMaxEntry, MaxesView } from "@/db/athleteMaxes";
import type { RosterEntry } from "@/db/athleteAccess";
import type { AthleteOverview, CurrentMax, Equipment } from "@/db/athleteProfiles";
import type { CsvResult } from "@/lib/athlete/maxesCsv";
import type { AsJson } from "../json";

export type { CurrentMax, Equipment } from "@/db/athleteProfiles";
export type { MaxKind, MaxSource, PlateSet as Plates, Units } from "@/db/database";
export type { MaxField as CsvField } from "@/lib/athlete/maxEntry";
export type { CsvProblem, CsvRow } from "@/lib/athlete/maxesCsv";

export type MaxEntry = AsJson<StoredMaxEntry>;

/** GET /api/athletes — the coach's athletes, by name. */
export type RosterResponse = { athletes: RosterEntry[] };

/** GET /api/athletes/[id] */
export type AthleteResponse = AthleteOverview;

/** PUT /api/athletes/[id]/equipment — `recomputed`: upcoming sessions re-planned. */
export type EquipmentResponse = { equipment: Equipment; recomputed: number };

/** GET /api/athletes/[id]/maxes — `units` is the athlete's; each history's first entry is the current max. */
export type MaxesResponse = AsJson<MaxesView>;

/** POST /api/athletes/[id]/maxes (201) */
export type AddMaxResponse = { max: CurrentMax; recomputed: number };
/** POST body of /api/athletes/[id]/maxes: the CSV columns. */
export type AddMaxBody = { exercise: string; value: number | string; unit: string; date: string; kind?: string; source?: string; note?: string | null };

/** DELETE /api/athletes/[id]/maxes/[maxId] */
export type DeleteMaxResponse = { deleted: true; recomputed: number };

/** POST /api/athletes/[id]/maxes/csv?mode=preview — nothing written; `repeats`: lines already on file, which apply skips. */
export type CsvPreviewResponse = { mode: "preview"; repeats: number[] } & CsvResult;
/** POST /api/athletes/[id]/maxes/csv?mode=apply — every row added, or a 422 naming `rows.<line>.<column>`. */
export type CsvApplyResponse = { mode: "apply"; added: number; skipped: number; recomputed: number };
