const STORAGE_KEY = 'tracewright.bench.alarm-acks';
const KEEP = 200;

function read(): string[] {
  try {
    const parsed: unknown = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter((k): k is string => typeof k === 'string') : [];
  } catch {
    return [];
  }
}

function write(keys: string[]): void {
  try {
    localStorage.setItem(STORAGE_KEY, JSON.stringify(keys.slice(-KEEP)));
  } catch {
    // Storage full or blocked: the alarm then rings again after a reload, which is the safe side.
  }
}

/** Timer alarms the operator has acknowledged, remembered across reloads on this tablet. */
export const alarmAcks = {
  has: (key: string) => read().includes(key),
  add(key: string) {
    const keys = read();
    if (!keys.includes(key)) write([...keys, key]);
  },
  /** A timer started offline gets its server id once sent: carry its acknowledgement over. */
  alias(fromKey: string, toKey: string) {
    if (alarmAcks.has(fromKey)) alarmAcks.add(toKey);
  },
};
