/**
 * Table interfaces for Kysely. One interface per table; nullable columns are
 * `T | null`, never optional, so every insert states what it leaves empty.
 */
import type { ColumnType, Generated } from "kysely";
import type { Programme } from "../lib/notation/model";

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

export interface Database {
  gyms: GymsTable;
  users: UsersTable;
  templates: TemplatesTable;
  template_versions: TemplateVersionsTable;
  template_drafts: TemplateDraftsTable;
  share_links: ShareLinksTable;
  coach_exercises: CoachExercisesTable;
}
