"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ShareLinkListResponse, ShareLinkResponse } from "@/app/api/templates/types";
import { api, describeFailure } from "./api";

/** Read-only links to one version; anyone with the link sees it, nothing else. */
export function SharePanel({ templateId, latestVersion }: { templateId: string; latestVersion: number | null }) {
  const qc = useQueryClient();
  const key = ["share-links", templateId];
  const links = useQuery({ queryKey: key, queryFn: () => api<ShareLinkListResponse>(`/api/templates/${templateId}/share`) });
  const create = useMutation({
    mutationFn: () => api<ShareLinkResponse>(`/api/templates/${templateId}/share`, { method: "POST", json: { versionNumber: latestVersion } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key }),
  });
  const revoke = useMutation({
    mutationFn: (token: string) => api(`/api/share/${token}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key }),
  });
  const origin = typeof window === "undefined" ? "" : window.location.origin;
  return (
    <div className="space-y-3 text-sm">
      <button type="button" className="btn-quiet" disabled={!latestVersion || create.isPending} onClick={() => create.mutate()}>
        {latestVersion ? `Share version ${latestVersion} by link` : "Save a version to share it"}
      </button>
      {create.isError ? <p role="alert" className="text-ember-700">{describeFailure(create.error)}</p> : null}
      <ul className="space-y-2" data-testid="share-links">
        {links.data?.links.map((l) => (
          <li key={l.token} className="flex flex-wrap items-center gap-2 rounded-md bg-chalk-100 px-2 py-1.5">
            <span className="font-mono text-xs">v{l.versionNumber}</span>
            <input readOnly value={`${origin}${l.url}`} aria-label={`Share link for version ${l.versionNumber}`} className="min-w-0 flex-1 rounded border border-iron-200 bg-white px-2 py-1 font-mono text-xs" onFocus={(e) => e.target.select()} />
            <a href={l.url} target="_blank" rel="noreferrer" className="text-xs font-semibold text-ember-600 hover:underline">Open</a>
            <button type="button" className="text-xs font-semibold text-iron-500 hover:text-ember-700" onClick={() => revoke.mutate(l.token)}>Revoke</button>
          </li>
        ))}
      </ul>
    </div>
  );
}
