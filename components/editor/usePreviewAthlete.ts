"use client";
import { useQuery } from "@tanstack/react-query";
import { useCallback, useEffect, useMemo, useState } from "react";
import type { AthleteResponse, RosterResponse } from "@/app/api/athletes/types";
import { toExpansionProfile } from "@/lib/athlete/expansion";
import type { AthleteProfile } from "@/lib/athlete/profile";
import { api, ApiFailure } from "../templates/api";

const CHOICE_KEY = "iq-preview-athlete";

export type PreviewAthlete = {
  roster: { id: string; name: string }[];
  /** The athlete picked, or null for the sample athlete. */
  chosenId: string | null;
  choose(id: string | null): void;
  /** The chosen athlete's profile, built as the server builds it; null while loading or for the sample. */
  profile: AthleteProfile | null;
  loading: boolean;
  problem: string | null;
};

/**
 * Which athlete the workbench preview works loads for: one of the coach's
 * athletes, fetched with their gym and current maxes, or the sample. The
 * choice is remembered on this device; maxes are fetched again when the tab
 * regains focus, since a coach changes them on the athlete's page.
 */
export function usePreviewAthlete(): PreviewAthlete {
  const [chosenId, setChosenId] = useState<string | null>(null);
  useEffect(() => {
    try {
      setChosenId(localStorage.getItem(CHOICE_KEY));
    } catch {
      /* storage unavailable: start from the sample */
    }
  }, []);
  const choose = useCallback((id: string | null) => {
    setChosenId(id);
    try {
      if (id) localStorage.setItem(CHOICE_KEY, id);
      else localStorage.removeItem(CHOICE_KEY);
    } catch {
      /* the choice just is not remembered */
    }
  }, []);

  const roster = useQuery({
    queryKey: ["athlete-roster"],
    queryFn: () => api<RosterResponse>("/api/athletes"),
    staleTime: 60_000,
  });
  const list = roster.data?.athletes;
  // Asked for only once the roster holds the id: a choice remembered from another account on this device is never fetched.
  const onRoster = chosenId !== null && !!list?.some((a) => a.id === chosenId);
  const athlete = useQuery({
    queryKey: ["athlete", chosenId],
    queryFn: () => api<AthleteResponse>(`/api/athletes/${chosenId}`),
    enabled: onRoster,
    refetchOnWindowFocus: true,
    retry: (count, e) => !(e instanceof ApiFailure && e.status >= 400 && e.status < 500) && count < 2,
  });

  // A remembered athlete who left the roster falls back to the sample.
  useEffect(() => {
    if (chosenId && list && !list.some((a) => a.id === chosenId)) choose(null);
  }, [chosenId, list, choose]);

  const data = chosenId !== null && athlete.data?.athlete.id === chosenId ? athlete.data : null;
  const profile = useMemo(() => (data ? toExpansionProfile(data.athlete.name, data.equipment, data.maxes) : null), [data]);
  const problem =
    roster.isError ? "Your athletes could not be loaded; the preview uses the sample athlete."
    : chosenId !== null && athlete.isError ? "That athlete's maxes could not be loaded; the preview uses the sample athlete."
    : null;

  const rosterList = useMemo(() => (list ?? []).map((a) => ({ id: a.id, name: a.name })), [list]);
  const loading = chosenId !== null && !roster.isError && !athlete.isError && (roster.isPending || athlete.isPending);
  // One object while nothing changed, so the memoised panel skips keystrokes.
  return useMemo(() => ({ roster: rosterList, chosenId, choose, profile, loading, problem }), [rosterList, chosenId, choose, profile, loading, problem]);
}
