"use client";
// Reads from the tablet's IndexedDB and re-renders when what was read changes (dexie liveQuery).
import { useEffect, useState } from "react";
import { liveQuery } from "dexie";

/** The latest answer of `query`; `initial` until the first one. `key` re-subscribes when it changes. */
export function useLive<T>(query: () => Promise<T>, key: string, initial: T): { value: T; ready: boolean } {
  const [state, setState] = useState<{ key: string; value: T; ready: boolean }>({ key, value: initial, ready: false });
  useEffect(() => {
    const sub = liveQuery(query).subscribe({
      next: (value) => setState({ key, value, ready: true }),
      error: (err) => console.error("judging: reading the tablet's copy failed", err),
    });
    return () => sub.unsubscribe();
    // The query is rebuilt every render; `key` says when it means something else.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return state.key === key ? { value: state.value, ready: state.ready } : { value: initial, ready: false };
}
