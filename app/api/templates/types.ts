/**
 * JSON shapes of the template and share-link API, for the pages that call it.
 * Types only. Dates travel as ISO 8601 strings. Every failure is an
 * `ApiError` with the HTTP status of its code.
 */
import type { Programme } from "@/lib/notation/model";

export type Visibility = "private" | "link" | "listed";

export type ApiError = {
  error: {
    code: "unauthenticated" | "forbidden" | "not_found" | "invalid_input" | "conflict" | "rate_limited" | "unavailable" | "internal";
    message: string;
    /** Field path → message, e.g. `{ "title": "Give the template a title" }`, `{ "tags.2": "…" }`. */
    fields: Record<string, string>;
    /** Only when a programme does not parse: every error, positioned (1-based line and column). */
    diagnostics?: SourceProblem[];
  };
};

export type SourceProblem = { line: number; column: number; length: number; severity: "error" | "warning" | "info"; message: string };

export type VersionRef = { id: string; number: number; createdAt: string };

export type TemplateSummary = {
  id: string;
  title: string;
  description: string;
  tags: string[];
  visibility: Visibility;
  archived: boolean;
  latestVersion: VersionRef | null;
  updatedAt: string;
  hasDraft: boolean;
};

export type VersionSummary = { id: string; number: number; note: string | null; createdAt: string; authorName: string };

export type TemplateDetail = TemplateSummary & {
  createdAt: string;
  forkedFrom: { templateId: string; title: string; versionNumber: number } | null;
  /** Newest first. */
  versions: VersionSummary[];
};

/** GET /api/templates?q=&tag=&page=&pageSize=&archived=include */
export type TemplateListResponse = { items: TemplateSummary[]; total: number; page: number; pageSize: number };

/** POST /api/templates, /import, /from-sample, /[id]/fork (201); GET and PATCH /api/templates/[id]. */
export type TemplateResponse = { template: TemplateDetail };

/** DELETE /api/templates/[id]: archived when athletes were given the template. */
export type DeleteTemplateResponse = { outcome: "deleted" | "archived" };

/** GET /api/templates/[id]/versions */
export type VersionListResponse = { versions: VersionSummary[] };

/** POST /api/templates/[id]/versions: 201 when saved; 200 and `created: false` when the text equals the latest version. */
export type SaveVersionResponse = { created: boolean; version: VersionSummary; message: string };

/** GET /api/templates/[id]/versions/[number|latest] (add ?format=iq for the source as a .iq download). */
export type VersionResponse = {
  version: VersionSummary & { templateId: string; templateTitle: string; source: string; model: Programme };
};

/** GET/PUT/DELETE /api/templates/[id]/draft and /api/templates/drafts/new */
export type DraftResponse = { draft: { source: string; baseVersion: number | null; updatedAt: string } | null };
export type DraftSavedResponse = { savedAt: string };
export type DraftClearedResponse = { cleared: boolean };

/** GET /api/templates/samples */
export type SamplesResponse = { samples: { name: string; title: string; description: string }[] };

export type ShareLink = { token: string; versionNumber: number; createdAt: string; /** Path of the public page. */ url: string };

/** POST /api/templates/[id]/share (201, or 200 with `reused` when that version already had a working link). */
export type ShareLinkResponse = { link: ShareLink; reused: boolean };
/** GET /api/templates/[id]/share: links that still work, newest first. */
export type ShareLinkListResponse = { links: ShareLink[] };
/** DELETE /api/share/[token] */
export type RevokeResponse = { revoked: true };

/** GET /api/share/[token] (public, read-only). */
export type SharedVersionResponse = {
  shared: {
    title: string;
    description: string;
    versionNumber: number;
    versionCreatedAt: string;
    source: string;
    model: Programme;
    ownerName: string;
  };
};
