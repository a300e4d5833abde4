/**
 * Table interfaces for Kysely. One interface per table; nullable columns are
 * `T | null`, never optional, so every insert states what it leaves empty.
 */
import type { ColumnType, Generated } from "kysely";
import type { Programme } from "../lib/notation/model";
import type { Session as SessionPlan } from "../lib/load/types";

export type Role = "admin" | "coach" | "athlete";

type CreatedAt = ColumnType<Date, Date | string | undefined, never>;

export interface GymsTable {
  id: Generated<string>;
  name: string;
  city: string | null;
  created_at: CreatedAt;
}

export interface UsersTable {
  id: Generated<string>;
  email: string;
  name: string;
  password_hash: string;
  role: Role;
  /** The athlete's coach; null for coaches, admins and self-coached athletes. */
  coach_id: string | null;
  gym_id: string | null;
  disabled_at: Date | null;
  /** Last password change; sessions signed in before it no longer count. */
  credentials_changed_at: Date | null;
  created_at: CreatedAt;
}

export type Visibility = "private" | "link" | "listed";

export interface TemplatesTable {
  id: Generated<string>;
  owner_id: string;
  title: string;
  description: string;
  tags: string[];
  visibility: Visibility;
  /** Set instead of deleting when athletes were given the template. */
  archived_at: Date | null;
  created_at: CreatedAt;
  updated_at: ColumnType<Date, Date | string | undefined, Date | string>;
  forked_from_version_id: string | null;
}

/** Immutable once inserted (a database trigger refuses UPDATE and DELETE). */
export interface TemplateVersionsTable {
  id: Generated<string>;
  template_id: string;
  /** 1, 2, 3… within a template. */
  number: number;
  source: string;
  /** The parsed programme; written as JSON text, read back as an object. */
  model: ColumnType<Programme, string, never>;
  author_id: string;
  note: string | null;
  created_at: CreatedAt;
}

export interface TemplateDraftsTable {
  owner_id: string;
  /** The template's id, or "new" for a programme not yet saved as a template. */
  draft_key: string;
  template_id: string | null;
  source: string;
  /** The version number the editor started from; null for "new". */
  base_version: number | null;
  updated_at: ColumnType<Date, Date | string | undefined, Date | string>;
}

export interface ShareLinksTable {
  /** 256 random bits, base64url. */
  token: string;
  template_id: string;
  version_id: string;
  created_by: string;
  created_at: CreatedAt;
  revoked_at: Date | null;
}

export type ExerciseEquipment = "barbell" | "dumbbell" | "cable" | "machine" | "bodyweight" | "other";
export type ExerciseMediaType = "image/jpeg" | "image/png" | "image/webp" | "video/mp4" | "video/webm";

/** A coach's own exercise; the built-in catalogue lives in lib/exercises and is not stored. */
export interface CoachExercisesTable {
  id: Generated<string>;
  owner_id: string;
  name: string;
  aliases: string[];
  equipment: ExerciseEquipment;
  primary_muscles: string[];
  movement_pattern: string | null;
  cues: string;
  substitution_group: string | null;
  /** Storage key of the uploaded picture or clip; null without media. */
  media_key: string | null;
  /** The type read from the file's bytes, not the one the browser declared. */
  media_type: ExerciseMediaType | null;
  created_at: CreatedAt;
  updated_at: ColumnType<Date, Date | string | undefined, Date | string>;
}

export type Units = "kg" | "lb";
type UpdatedAt = ColumnType<Date, Date | string | undefined, Date | string>;
/** A calendar date as "YYYY-MM-DD" (db/client.ts keeps pg from turning it into a Date). */
type CalendarDate = string;

/** Plates as the athlete profile takes them: plain weights, or weights with the pairs on hand. */
export type PlateSet = number[] | { weight: number; pairs: number }[];

export interface AthleteProfilesTable {
  user_id: string;
  units: Units;
  bodyweight: number | null;
  bar: number;
  plates: ColumnType<PlateSet, string, string>;
  dumbbell_step: number;
  machine_step: number;
  /** The preset the equipment started from ("kg-club", "lb-garage"…); null once edited by hand. */
  preset: string | null;
  updated_by: string | null;
  updated_at: UpdatedAt;
}

export type MaxKind = "1rm" | "tm";
export type MaxSource = "tested" | "estimated" | "logs";

export interface AthleteMaxesTable {
  id: Generated<string>;
  athlete_id: string;
  exercise: string;
  exercise_key: string;
  kind: MaxKind;
  value: number;
  units: Units;
  measured_on: CalendarDate;
  source: MaxSource;
  note: string | null;
  created_by: string | null;
  created_at: CreatedAt;
}

export interface InvitationsTable {
  id: Generated<string>;
  coach_id: string;
  email: string;
  name: string | null;
  token_hash: string;
  expires_at: Date;
  sent_at: ColumnType<Date, Date | string | undefined, Date | string>;
  accepted_at: Date | null;
  accepted_user_id: string | null;
  revoked_at: Date | null;
  created_at: CreatedAt;
}

export interface PasswordResetsTable {
  token_hash: string;
  user_id: string;
  expires_at: Date;
  used_at: Date | null;
  created_at: CreatedAt;
}

export interface TemplateAssignmentsTable {
  id: Generated<string>;
  template_id: string;
  version_id: string;
  athlete_id: string;
  assigned_by: string | null;
  start_date: CalendarDate;
  weekdays: string[];
  status: ColumnType<"active" | "ended", "active" | "ended" | undefined, "active" | "ended">;
  auto_regulate: ColumnType<boolean, boolean | undefined, boolean>;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
  ended_at: Date | null;
}

export interface TrainingSessionsTable {
  id: Generated<string>;
  assignment_id: string;
  athlete_id: string;
  ordinal: number;
  planned_date: CalendarDate;
  date: CalendarDate;
  title: string;
  /** The expanded session (lib/load Session) with loads and plates; JSON text in, object out. */
  plan: ColumnType<SessionPlan, string, string>;
  computed_at: UpdatedAt;
  logged_at: Date | null;
  completed_at: Date | null;
}

export interface CalendarFeedsTable {
  token: string;
  athlete_id: string;
  created_at: CreatedAt;
  revoked_at: Date | null;
}

export type JobStatus = "queued" | "running" | "done" | "failed";

export interface JobRunsTable {
  id: Generated<string>;
  kind: string;
  requested_by: string | null;
  status: ColumnType<JobStatus, JobStatus | undefined, JobStatus>;
  total: ColumnType<number, number | undefined, number>;
  done: ColumnType<number, number | undefined, number>;
  failed: ColumnType<number, number | undefined, number>;
  payload: ColumnType<Record<string, unknown>, string | undefined, string>;
  result: ColumnType<Record<string, unknown> | null, string | null, string | null>;
  error: string | null;
  created_at: CreatedAt;
  finished_at: Date | null;
}

/** One logged set; (session_id, exercise_index, set_index) is unique. */
export interface SetLogsTable {
  id: Generated<string>;
  session_id: string;
  athlete_id: string;
  /** Index in plan.exercises. */
  exercise_index: number;
  /** Index in the sets of the exercise done (warm-ups first). */
  set_index: number;
  kind: "warmup" | "work";
  /** The exercise done: the substitute's name when swapped. */
  exercise: string;
  exercise_key: string;
  planned_exercise: string;
  planned_reps: number | null;
  planned_load: number | null;
  planned_seconds: number | null;
  bodyweight: ColumnType<boolean, boolean | undefined, boolean>;
  reps: number;
  load: number;
  unit: Units;
  rir: number | null;
  done: ColumnType<boolean, boolean | undefined, boolean>;
  client_id: string | null;
  client_updated_at: ColumnType<Date, Date | string, Date | string>;
  logged_at: CreatedAt;
  updated_at: UpdatedAt;
}

/** The exercise chosen for a slot of a session (a substitute or the planned one) and its note. */
export interface SessionExerciseLogsTable {
  session_id: string;
  exercise_index: number;
  athlete_id: string;
  exercise: string;
  exercise_key: string;
  note: string | null;
  updated_at: UpdatedAt;
}

export type ProposalStatus = "open" | "accepted" | "dismissed";

/** A max proposed from the logs; at most one open per athlete and exercise. */
export interface MaxProposalsTable {
  id: Generated<string>;
  athlete_id: string;
  assignment_id: string;
  exercise: string;
  exercise_key: string;
  current_max_id: string | null;
  current_value: number;
  proposed_value: number;
  estimate: number;
  units: Units;
  basis: ColumnType<{ sessionId: string; date: string; e1rm: number; reps: number; load: number; rir: number | null }[], string, string>;
  status: ColumnType<ProposalStatus, ProposalStatus | undefined, ProposalStatus>;
  decided_at: Date | null;
  decided_by: string | null;
  accepted_max_id: string | null;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}

export interface Database {
  gyms: GymsTable;
  users: UsersTable;
  templates: TemplatesTable;
  template_versions: TemplateVersionsTable;
  template_drafts: TemplateDraftsTable;
  share_links: ShareLinksTable;
  coach_exercises: CoachExercisesTable;
  athlete_profiles: AthleteProfilesTable;
  athlete_maxes: AthleteMaxesTable;
  invitations: InvitationsTable;
  password_resets: PasswordResetsTable;
  template_assignments: TemplateAssignmentsTable;
  training_sessions: TrainingSessionsTable;
  calendar_feeds: CalendarFeedsTable;
  job_runs: JobRunsTable;
  set_logs: SetLogsTable;
  session_exercise_logs: SessionExerciseLogsTable;
  max_proposals: MaxProposalsTable;
  listings: ListingsTable;
  purchases: PurchasesTable;
  entitlements: EntitlementsTable;
  webhook_events: WebhookEventsTable;
  recipes: RecipesTable;
  recipe_ingredients: RecipeIngredientsTable;
  recipe_attachments: RecipeAttachmentsTable;
}

export type ListingLevel = "beginner" | "intermediate" | "advanced";

/** A coach's template offered for sale; money in integer minor units of `currency` (ISO 4217, lower case). */
export interface ListingsTable {
  id: Generated<string>;
  template_id: string;
  seller_id: string;
  /** The version buyers receive and the preview shows. */
  version_id: string;
  slug: string;
  price_minor: number;
  currency: string;
  /** The public description shown in the store. */
  summary: string;
  level: ListingLevel;
  weeks: number;
  days_per_week: number;
  /** Set while the coach offers it; null when withdrawn or never offered. */
  listed_at: Date | null;
  /** Set when an admin took it out of the store. */
  unlisted_at: Date | null;
  unlisted_by: string | null;
  unlisted_reason: string | null;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}

export type PurchaseStatus = "pending" | "paid" | "refunded";

export interface PurchasesTable {
  id: Generated<string>;
  /** Receipt number; bigint comes back from pg as a string. */
  number: ColumnType<string, never, never>;
  listing_id: string | null;
  version_id: string | null;
  buyer_id: string;
  seller_id: string;
  title: string;
  amount_minor: number;
  currency: string;
  status: ColumnType<PurchaseStatus, PurchaseStatus | undefined, PurchaseStatus>;
  attempt_id: string;
  checkout_session_id: string | null;
  payment_intent_id: string | null;
  refund_id: string | null;
  copy_template_id: string | null;
  created_at: CreatedAt;
  paid_at: Date | null;
  refunded_at: Date | null;
  /** Null until the receipt e-mail has gone out. */
  receipt_mailed_at: Date | null;
}

/** The buyer's right to their copy of a purchased version; revoked (not deleted) on refund. */
export interface EntitlementsTable {
  id: Generated<string>;
  purchase_id: string;
  user_id: string;
  template_id: string;
  source_version_id: string | null;
  granted_at: CreatedAt;
  revoked_at: Date | null;
}

/** Every payment-provider event handled, once: the provider's event id is the key. */
export interface WebhookEventsTable {
  id: string;
  type: string;
  outcome: string;
  purchase_id: string | null;
  received_at: CreatedAt;
}

/** A coach's recipe; its ingredients are rows of recipe_ingredients. */
export interface RecipesTable {
  id: Generated<string>;
  owner_id: string;
  title: string;
  servings: number;
  steps: string[];
  created_at: CreatedAt;
  updated_at: ColumnType<Date, Date | string | undefined, Date | string>;
}

/** One ingredient: an amount (g, ml with a density, or pieces with a weight) and its label per 100 g. */
export interface RecipeIngredientsTable {
  id: Generated<string>;
  recipe_id: string;
  position: number;
  name: string;
  kind: "g" | "ml" | "piece";
  amount: number;
  density: number | null;
  piece_grams: number | null;
  energy_kcal: number;
  protein: number;
  carbohydrate: number;
  fat: number;
  fibre: number | null;
}

/** A recipe shown to the athletes of a template, or to one athlete through an assignment (exactly one is set). */
export interface RecipeAttachmentsTable {
  id: Generated<string>;
  recipe_id: string;
  template_id: string | null;
  assignment_id: string | null;
  attached_by: string | null;
  created_at: CreatedAt;
}
