import { useEffect, useState } from 'react';

/** `value` once it has stopped changing for `delayMs` (compared by its JSON). */
export function useDebouncedValue<T>(value: T, delayMs = 300): T {
  const [settled, setSettled] = useState(value);
  const json = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(JSON.parse(json) as T), delayMs);
    return () => clearTimeout(timer);
  }, [json, delayMs]);
  return settled;
}
