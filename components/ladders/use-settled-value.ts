"use client";

import { useEffect, useState } from "react";

/**
 * The latest usable value once it has stayed the same for `delayMs`, so a request runs per pause in
 * typing rather than per keystroke. `null` means "not usable right now" (a half-typed form) and is
 * skipped: the last usable value stays. The first value counts at once, so nothing waits on open.
 * Values are compared by their JSON, since forms hand out a fresh object on every change.
 */
export function useSettledValue<T>(value: T | null, delayMs = 500): T | null {
  const key = value === null ? null : JSON.stringify(value);
  const [settled, setSettled] = useState<{ key: string; value: T } | null>(() => (key === null ? null : { key, value: value as T }));

  useEffect(() => {
    if (key === null) return;
    const timer = setTimeout(() => {
      setSettled((previous) => (previous?.key === key ? previous : { key, value: JSON.parse(key) as T }));
    }, delayMs);
    return () => clearTimeout(timer);
  }, [key, delayMs]);

  return settled?.value ?? null;
}
