/**
 * Every migration, in order. Listed by hand (not read from disk) so that the
 * app bundle, tsx and Vitest all load them the same way. Add new files at the end.
 */
import type { Migration } from "kysely";
import * as m0001 from "./2026-12-01T0001_users";
import * as m0002 from "./2026-12-01T0002_templates";
import * as m0003 from "./2026-12-01T0003_exercises";
import * as m0004 from "./2026-12-01T0004_athletes";
import * as m0005 from "./2026-12-01T0005_logs";
import * as m0006 from "./2026-12-01T0006_store";
import * as m0007 from "./2026-12-01T0007_recipes";
import * as m0008 from "./2026-12-02T0008_sessions";
import * as m0009 from "./2026-12-02T0009_receipt_mail";

export const migrations: Record<string, Migration> = {
  "2026-12-01T0001_users": m0001,
  "2026-12-01T0002_templates": m0002,
  "2026-12-01T0003_exercises": m0003,
  "2026-12-01T0004_athletes": m0004,
  "2026-12-01T0005_logs": m0005,
  "2026-12-01T0006_store": m0006,
  "2026-12-01T0007_recipes": m0007,
  "2026-12-02T0008_sessions": m0008,
  "2026-12-02T0009_receipt_mail": m0009,
};
