import { useCallback, useState, type ChangeEvent } from 'react';

type FieldElement = HTMLInputElement | HTMLTextAreaElement | HTMLSelectElement;

/**
 * A card's fields as the text the person typed; the card parses on every render, so results follow
 * each keystroke without a submit button (the calculations take microseconds).
 */
export function useCalcFields<K extends string>(initial: Readonly<Record<K, string>>) {
  const [values, setValues] = useState<Readonly<Record<K, string>>>(initial);
  const set = useCallback((key: K, value: string) => setValues((all) => ({ ...all, [key]: value })), []);
  const bind = (key: K) => ({ value: values[key], onChange: (event: ChangeEvent<FieldElement>) => set(key, event.target.value) });
  return { values, bind, set };
}
