import { useCallback, useEffect, useState } from 'react';

export type AsyncValue<T> = { value: T | undefined; error: Error | null; reload: () => void };

/**
 * Loads a value whenever `load` changes (pass a useCallback with the inputs as its deps);
 * `reload` loads it again after a change.
 */
export const useAsync = <T,>(load: () => Promise<T>): AsyncValue<T> => {
  const [value, setValue] = useState<T | undefined>(undefined);
  const [error, setError] = useState<Error | null>(null);
  const run = useCallback(() => {
    let live = true;
    load().then(
      (v) => { if (live) { setValue(v); setError(null); } },
      (e: unknown) => { if (live) setError(e instanceof Error ? e : new Error(String(e))); },
    );
    return () => { live = false; };
  }, [load]);
  useEffect(run, [run]);
  const reload = useCallback(() => { run(); }, [run]);
  return { value, error, reload };
};
