/**
 * JSON shapes of the invitation API, for the roster page. Dates travel as ISO 8601 strings.
 * Failures are the app's usual `{ error: { code, message, fields } }`.
 */
export type InvitationState = "pending" | "accepted" | "expired" | "revoked";

export type InvitationItem = {
  id: string;
  email: string;
  name: string | null;
  state: InvitationState;
  expiresAt: string;
  sentAt: string;
  createdAt: string;
  acceptedAt: string | null;
};

export type InvitationListResponse = { invitations: InvitationItem[] };
export type InvitationResponse = { invitation: InvitationItem };
