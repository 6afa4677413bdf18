import { readFileSync } from 'node:fs';

/** Linux reports a process's CPU time in clock ticks; 100 a second on every usual kernel (`getconf CLK_TCK`). */
const TICKS_PER_SECOND = 100;

/**
 * CPU time (user + system, all threads) a process has used so far, in µs, read from
 * /proc/<pid>/stat; null where that cannot be read (not Linux, process gone).
 */
export function processCpuMicros(pid: number | undefined): number | null {
  if (!pid) return null;
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    // The command name (field 2) may hold spaces; the numbered fields start after its ")".
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    const ticks = Number(fields[11]) + Number(fields[12]); // utime, stime (fields 14 and 15)
    return Number.isFinite(ticks) ? (ticks * 1_000_000) / TICKS_PER_SECOND : null;
  } catch {
    return null;
  }
}

/** CPU used by this (the app server's) process and the database server while `work` runs. */
export async function measureCpu<T>(databasePid: number | undefined, work: () => Promise<T>): Promise<{ result: T; appMicros: number; databaseMicros: number | null }> {
  const app0 = process.cpuUsage();
  const db0 = processCpuMicros(databasePid);
  const result = await work();
  const app = process.cpuUsage(app0);
  const db1 = processCpuMicros(databasePid);
  return { result, appMicros: app.user + app.system, databaseMicros: db0 === null || db1 === null ? null : db1 - db0 };
}
