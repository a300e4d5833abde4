/**
 * JSON shapes of the athlete profile API, for the pages that call it. Types
 * only. Dates measured are "YYYY-MM-DD"; entry times are ISO 8601 strings.
 * Failures are the shared `ApiError` (app/api/templates/types.ts).
 */
export type Units = "kg" | "lb";
export type MaxKind = "1rm" | "tm";
export type MaxSource = "tested" | "estimated" | "logs";
export type Plates = number[] | { weight: number; pairs: number }[];

export type Equipment = {
  units: Units;
  bodyweight: number | null;
  bar: number;
  plates: Plates;
  dumbbellStep: number;
  machineStep: number;
  /** The preset these values are exactly; null once edited by hand. */
  preset: string | null;
  /** False while nothing is stored and these are the kg club defaults. */
  stored: boolean;
};

export type CurrentMax = { id: string; exercise: string; exerciseKey: string; kind: MaxKind; value: number; units: Units; measuredOn: string; source: MaxSource };
export type MaxEntry = CurrentMax & { note: string | null; createdAt: string; createdBy: string | null };

/** GET /api/athletes/[id] */
export type AthleteResponse = { athlete: { id: string; name: string; email: string }; equipment: Equipment; maxes: CurrentMax[] };

/** PUT /api/athletes/[id]/equipment — `recomputed`: upcoming sessions re-planned. */
export type EquipmentResponse = { equipment: Equipment; recomputed: number };

/** GET /api/athletes/[id]/maxes — `units` is the athlete's; each history's first entry is the current max. */
export type MaxesResponse = { units: Units; current: CurrentMax[]; history: { exerciseKey: string; exercise: string; entries: MaxEntry[] }[] };

/** POST /api/athletes/[id]/maxes (201) */
export type AddMaxResponse = { max: CurrentMax; recomputed: number };
/** POST body of /api/athletes/[id]/maxes: the CSV columns. */
export type AddMaxBody = { exercise: string; value: number | string; unit: string; date: string; kind?: string; source?: string; note?: string | null };

/** DELETE /api/athletes/[id]/maxes/[maxId] */
export type DeleteMaxResponse = { deleted: true; recomputed: number };

export type CsvField = "exercise" | "value" | "unit" | "date" | "kind" | "source" | "note";
export type CsvProblem = { line: number; field: CsvField | "file" | "row"; message: string; suggestions?: string[] };
export type CsvRow = {
  line: number;
  cells: Partial<Record<CsvField, string>>;
  max: { exercise: string; exerciseKey: string; value: number; unit: Units; date: string; kind: MaxKind; source: MaxSource; note: string | null } | null;
  problems: CsvProblem[];
};

/** POST /api/athletes/[id]/maxes/csv?mode=preview — nothing written. */
export type CsvPreviewResponse = { mode: "preview"; ok: boolean; rows: CsvRow[]; fileProblems: CsvProblem[]; problems: CsvProblem[] };
/** POST /api/athletes/[id]/maxes/csv?mode=apply — every row added, or a 422 naming `rows.<line>.<column>`. */
export type CsvApplyResponse = { mode: "apply"; added: number; recomputed: number };
