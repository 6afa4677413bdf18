import { Icon } from '../../../components/icons/icon';

type PinKeypadProps = { onDigit: (digit: string) => void; onDelete: () => void; onClear: () => void; disabled?: boolean };

const DIGITS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'];
// 80 px keys with 16 px gaps: well over the 48 px / 8 px minimum, for gloved hands.
const KEY =
  'flex h-20 items-center justify-center gap-2 rounded-lg border-2 border-graphite-500 bg-white text-3xl font-bold tabular hover:bg-graphite-50 active:bg-graphite-100 disabled:opacity-60';

export function PinKeypad({ onDigit, onDelete, onClear, disabled = false }: PinKeypadProps) {
  return (
    <div role="group" aria-label="Keypad" className="grid max-w-sm grid-cols-3 gap-4">
      {DIGITS.map((d) => (
        <button key={d} type="button" className={KEY} onClick={() => onDigit(d)} disabled={disabled}>
          {d}
        </button>
      ))}
      <button type="button" className={`${KEY} text-lg`} onClick={onClear} disabled={disabled}>
        Clear
      </button>
      <button type="button" className={KEY} onClick={() => onDigit('0')} disabled={disabled}>
        0
      </button>
      <button type="button" className={`${KEY} text-lg`} onClick={onDelete} disabled={disabled}>
        <Icon name="backspace" className="size-6" />
        Delete
      </button>
    </div>
  );
}
