import { useCallback, useEffect, useRef, useState } from 'react';

export type AsyncValue<T> = { value: T | undefined; error: Error | null; reload: () => void };

/**
 * Loads a value whenever `load` changes (pass a useCallback with the inputs as its deps);
 * `reload` loads it again after a change. `load` gets a signal that is aborted when its result is
 * no longer wanted. `initial`, when given, is the value already loaded (the start screen's data
 * read at launch, src/ui/startup.ts): it is the first state and the first load is skipped.
 */
export const useAsync = <T,>(load: (cancel: AbortSignal) => Promise<T>, initial?: T): AsyncValue<T> => {
  const [value, setValue] = useState<T | undefined>(initial);
  const skipFirst = useRef(initial !== undefined);
  const [error, setError] = useState<Error | null>(null);
  const run = useCallback(() => {
    let live = true;
    // aborted when the inputs change or the screen goes: a load that can stop early (the results
    // page's workers) stops; any other load's result is dropped
    const cancel = new AbortController();
    load(cancel.signal).then(
      (v) => { if (live) { setValue(v); setError(null); } },
      (e: unknown) => { if (live) setError(e instanceof Error ? e : new Error(String(e))); },
    );
    return () => { live = false; cancel.abort(); };
  }, [load]);
  useEffect(() => {
    if (skipFirst.current) { skipFirst.current = false; return undefined; }
    return run();
  }, [run]);
  const reload = useCallback(() => { run(); }, [run]);
  return { value, error, reload };
};
