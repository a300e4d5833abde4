import type { InvitationSummary } from "@/db/invitations";
import type { InvitationItem } from "./types";

/** A stored invitation as the API sends it: dates as ISO strings, nothing about the token. */
export function toItem(i: InvitationSummary): InvitationItem {
  return {
    id: i.id,
    email: i.email,
    name: i.name,
    state: i.state,
    expiresAt: i.expiresAt.toISOString(),
    sentAt: i.sentAt.toISOString(),
    createdAt: i.createdAt.toISOString(),
    acceptedAt: i.acceptedAt ? i.acceptedAt.toISOString() : null,
  };
}
