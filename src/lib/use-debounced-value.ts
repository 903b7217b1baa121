import { useEffect, useState } from 'react';

/**
 * The value as it was once it stopped changing for `delayMs`: for asking the server after a pause in
 * typing rather than at every key.
 * @param value the value that changes (keep objects stable with useMemo, or every render restarts the wait)
 * @param delayMs how long it must stay the same
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
