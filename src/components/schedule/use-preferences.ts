"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback } from "react";
import type { TPreferencesUpdate } from "@/schemas/preferences";
import { DEFAULT_PREFERENCES, type TPreferences } from "@/schemas/preferences-defaults";
import { api } from "./api-client";

export const PREFERENCES_KEY = ["preferences"] as const;

/**
 * The signed-in person's own view settings (units, folded totals, column sets), seeded from the
 * server render. A change shows at once and is saved in order behind earlier ones; a refusal
 * reloads what the server holds and calls onError.
 */
export function usePreferences(onError?: (message: string) => void) {
  const qc = useQueryClient();
  const { data } = useQuery({ queryKey: PREFERENCES_KEY, queryFn: () => api<TPreferences>("GET", "/api/me/preferences"), staleTime: Infinity });
  const mutation = useMutation({
    scope: { id: "preferences" },
    mutationFn: (changes: Omit<TPreferencesUpdate, "version">) => api<TPreferences>("PATCH", "/api/me/preferences", changes),
    onSuccess: (saved) => qc.setQueryData(PREFERENCES_KEY, saved),
    onError: (e) => {
      void qc.invalidateQueries({ queryKey: PREFERENCES_KEY });
      onError?.(e.message);
    },
  });
  const { mutate } = mutation;
  const update = useCallback(
    (changes: Omit<TPreferencesUpdate, "version">) => {
      qc.setQueryData<TPreferences>(PREFERENCES_KEY, (p) => {
        const base = p ?? DEFAULT_PREFERENCES;
        return { ...base, ...changes, active_column_sets: { ...base.active_column_sets, ...changes.active_column_sets } } as TPreferences;
      });
      mutate(changes);
    },
    [qc, mutate],
  );
  return { prefs: data ?? DEFAULT_PREFERENCES, update, saving: mutation.isPending };
}
