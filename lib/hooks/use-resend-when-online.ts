"use client";

import { useEffect, useState } from "react";

/**
 * For work kept on the device until the server has it (crew-log entries, a test-out reading):
 * calls `flush` once on mount, again whenever the browser comes back online, and every `everyMs`
 * while `hasPending()` says something is still waiting. Returns whether the browser is online.
 * `flush` must be stable (useCallback) and safe to call while a send is under way.
 */
export function useResendWhenOnline(flush: () => Promise<void>, hasPending: () => boolean, everyMs = 20_000): boolean {
  const [online, setOnline] = useState(true);
  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setOnline(navigator.onLine);
    void flush();
    const goOnline = () => {
      setOnline(true);
      void flush();
    };
    const goOffline = () => setOnline(false);
    window.addEventListener("online", goOnline);
    window.addEventListener("offline", goOffline);
    const timer = window.setInterval(() => {
      if (hasPending()) void flush();
    }, everyMs);
    return () => {
      window.removeEventListener("online", goOnline);
      window.removeEventListener("offline", goOffline);
      window.clearInterval(timer);
    };
  }, [flush, hasPending, everyMs]);
  return online;
}
