import { useEffect, useState } from 'react';

/**
 * The value as it was once it stopped changing for `delayMs`. Typing in a form fires a change per
 * key; estimates should run once the user pauses, not on every keystroke.
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
