"use client";
import { useQuery } from "@tanstack/react-query";
import type { NamesResponse } from "@/app/api/exercises/types";
import type { LibraryName } from "@/lib/exercises/resolve";
import { api } from "../templates/api";

/**
 * The coach's own exercise names, fresh whenever the editor tab regains focus:
 * "Add to library" opens the library in another tab, and the warning should
 * clear as soon as the coach comes back, without a reload.
 */
export function useLibraryNames(initial: LibraryName[]): LibraryName[] {
  const query = useQuery({
    queryKey: ["exercise-names"],
    queryFn: async () => {
      const r = await api<NamesResponse>("/api/exercises/names");
      return r.names.filter((n) => !n.builtIn).map(({ name, exercise, equipment }) => ({ name, exercise, equipment }));
    },
    initialData: initial,
    staleTime: 0,
    refetchOnWindowFocus: true,
  });
  return query.data;
}
