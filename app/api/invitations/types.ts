/**
 * JSON shapes of the invitation API, for the roster page, taken from
 * db/invitations.ts. Dates travel as ISO 8601 strings. Failures are the app's
 * usual `{ error: { code, message, fields } }`.
 */
import type { InvitationSummary } from "@/db/invitations";
import type { AsJson } from "../json";

export type { InvitationState } from "@/db/invitations";

export type InvitationItem = AsJson<InvitationSummary>;

export type InvitationListResponse = { invitations: InvitationItem[] };
export type InvitationResponse = { invitation: InvitationItem };
