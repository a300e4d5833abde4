import type { ShareLink } from "@/db/shareLinks";

/** Where the public read-only page of a link lives. */
export function sharePath(token: string): string {
  return `/share/${token}`;
}

export function withUrl(link: ShareLink) {
  return { token: link.token, versionNumber: link.versionNumber, createdAt: link.createdAt, url: sharePath(link.token) };
}
