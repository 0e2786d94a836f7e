import { useCallback, useEffect, useState } from 'react';

/** Any input with a name and a typed default: a check's input spec or a worksheet's input. */
export interface TypedInputSpec {
  name: string;
  default: string;
}

/** What each field starts with: the value from the link where there is one, otherwise the default. */
export function initialTexts(specs: readonly TypedInputSpec[], query: Record<string, string>): Record<string, string> {
  return Object.fromEntries(specs.map((spec) => [spec.name, query[spec.name] ?? spec.default]));
}

/** The value, once it has stopped changing for `delay` ms: results follow typing without recomputing per key. */
export function useSettled<T>(value: T, delay = 150): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delay);
    return () => clearTimeout(timer);
  }, [value, delay]);
  return settled;
}

/**
 * The text of each input as the reader types it, the settled texts to compute from, and whether
 * the reader has changed anything yet (until then the address is left as it was opened).
 */
export function useTypedInputs(specs: readonly TypedInputSpec[], query: Record<string, string>) {
  const [texts, setTexts] = useState(() => initialTexts(specs, query));
  const [touched, setTouched] = useState(false);
  const setText = useCallback((name: string, text: string) => {
    setTouched(true);
    setTexts((previous) => ({ ...previous, [name]: text }));
  }, []);
  return { texts, setText, settled: useSettled(texts), touched };
}
