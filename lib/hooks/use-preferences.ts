"use client";

import { useCallback, useState } from "react";
import useSWR from "swr";
import type { UnitSystem } from "@/db/schema";
import { fetcher, FetchError, sendJson } from "./fetcher";

type Preferences = { unitSystem: UnitSystem };
export const preferencesKey = "/api/me/preferences";

/**
 * The signed-in user's display units, kept in their user row. `initial` is what the page read
 * on the server, so the first paint is already in the right units; a change shows at once and
 * is saved, and goes back (with the reason) if the save fails.
 */
export function useUnitPreference(initial: UnitSystem) {
  const { data, mutate } = useSWR<Preferences>(preferencesKey, fetcher, { fallbackData: { unitSystem: initial }, revalidateOnFocus: false, revalidateOnMount: false });
  const [error, setError] = useState<string | null>(null);
  const setUnits = useCallback(
    async (unitSystem: UnitSystem) => {
      setError(null);
      try {
        await mutate(sendJson<Preferences>(preferencesKey, "PUT", { unitSystem }), { optimisticData: { unitSystem }, rollbackOnError: true, revalidate: false });
      } catch (err) {
        setError(err instanceof FetchError ? `Units not saved: ${err.message}` : "Units not saved: no connection. They apply on this page until you reload.");
      }
    },
    [mutate],
  );
  return { units: data?.unitSystem ?? initial, setUnits, error };
}
