/**
 * Table interfaces for Kysely. One interface per table; nullable columns are
 * `T | null`, never optional, so every insert states what it leaves empty.
 */
import type { ColumnType, Generated } from "kysely";

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

export interface Database {
  gyms: GymsTable;
  users: UsersTable;
}
