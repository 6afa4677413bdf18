import type { ReactNode } from 'react';

import { Icon } from '../../../components/icons/icon';

type ToggleChipProps = { isPressed: boolean; onToggle: () => void; children: ReactNode };

/** A filter that is on or off: pressed state in the tick and in `aria-pressed`, not colour alone. */
export function ToggleChip({ isPressed, onToggle, children }: ToggleChipProps) {
  const look = isPressed ? 'border-copper-700 bg-copper-50 text-graphite-900' : 'border-graphite-500 bg-white text-graphite-800 hover:bg-graphite-50';
  return (
    <button type="button" aria-pressed={isPressed} onClick={onToggle} className={`inline-flex min-h-11 items-center gap-2 rounded-full border-2 px-3 font-bold ${look}`}>
      {isPressed ? <Icon name="check" className="size-4" /> : <span className="size-4" aria-hidden="true" />}
      {children}
    </button>
  );
}
