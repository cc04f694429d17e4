"use client";
// Which columns the chair chose to see, kept in this browser's localStorage. Read through
// useSyncExternalStore so the server render and the first client render agree.
import { useCallback, useMemo, useSyncExternalStore } from "react";

const KEY = "ribbonry:chair-entries:columns";
const listeners = new Set<() => void>();

function subscribe(onChange: () => void) {
  listeners.add(onChange);
  window.addEventListener("storage", onChange);
  return () => {
    listeners.delete(onChange);
    window.removeEventListener("storage", onChange);
  };
}

const read = () => {
  try {
    return window.localStorage.getItem(KEY);
  } catch {
    return null; // storage blocked: fall back to the defaults
  }
};

export function useColumnVisibility(defaults: Record<string, boolean>) {
  const raw = useSyncExternalStore(subscribe, read, () => null);
  const visibility = useMemo<Record<string, boolean>>(() => {
    if (!raw) return defaults;
    try {
      const saved = JSON.parse(raw) as Record<string, unknown>;
      return Object.fromEntries(Object.entries(defaults).map(([k, v]) => [k, typeof saved[k] === "boolean" ? (saved[k] as boolean) : v]));
    } catch {
      return defaults;
    }
  }, [raw, defaults]);
  const setVisibility = useCallback(
    (next: Record<string, boolean> | ((prev: Record<string, boolean>) => Record<string, boolean>)) => {
      const value = typeof next === "function" ? next(visibility) : next;
      try {
        window.localStorage.setItem(KEY, JSON.stringify(value));
      } catch {
        // Storage full or blocked: the defaults stay.
      }
      listeners.forEach((l) => l());
    },
    [visibility],
  );
  return [visibility, setVisibility] as const;
}
