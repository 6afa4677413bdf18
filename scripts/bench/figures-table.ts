import { cpus } from 'node:os';

/** One measured figure beside its budget; `ok` is decided by the measuring code, never preset. */
export interface Figure {
  group: string;
  name: string;
  value: number;
  unit: string;
  target: string;
  ok: boolean;
}

/** A figure without a budget (shown for context, cannot miss). */
export const info = (group: string, name: string, value: number, unit: string): Figure => ({ group, name, value, unit, target: '—', ok: true });

/** The command line and the machine, printed above the table so figures can be compared fairly. */
export function machineLine(): string {
  const cores = cpus();
  return [`command: npm run bench${process.argv.length > 2 ? ` -- ${process.argv.slice(2).join(' ')}` : ''}`, `machine: ${cores.length} cores (${cores[0]?.model.trim() ?? 'unknown CPU'}), node ${process.version}, ${process.platform}`].join('\n');
}

const formatValue = (f: Figure) => {
  const digits = Number.isInteger(f.value) || Math.abs(f.value) >= 100 ? 0 : Math.abs(f.value) >= 10 ? 1 : 2;
  return `${f.value.toFixed(digits)} ${f.unit}`.trim();
};

/** The one table `npm run bench` ends with; `MISSED` marks every figure over its budget. */
export function figuresTable(figures: readonly Figure[]): string {
  const rows = figures.map((f) => [f.group, f.name, formatValue(f), f.target, f.target === '—' ? '' : f.ok ? 'met' : 'MISSED']);
  const header = ['group', 'measure', 'value', 'target', 'result'];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 2 ? c.padStart(widths[i] ?? 0) : c.padEnd(widths[i] ?? 0))).join('  ').trimEnd();
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}
