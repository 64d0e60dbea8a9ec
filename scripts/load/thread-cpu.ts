/**
 * Where a bench's CPU went: CPU seconds per thread of a process group, read from Linux's
 * /proc/<pid>/task/<tid>/stat before and after the load (utime + stime, in clock ticks). The
 * isolation bench prints it so a slow /api/health can be put down to a thread, not guessed at.
 * Elsewhere than Linux the snapshot is empty and nothing is printed.
 */
import { readdirSync, readFileSync } from "node:fs";

/** Linux's USER_HZ: /proc counts CPU time in these ticks. */
const TICKS_PER_SECOND = 100;

export interface ThreadTime {
  pid: number;
  tid: number;
  name: string;
  nice: number;
  ticks: number;
}

function statFields(file: string): { name: string; fields: string[] } | null {
  try {
    const text = readFileSync(file, "utf8");
    const close = text.lastIndexOf(")");
    return {
      name: text.slice(text.indexOf("(") + 1, close),
      fields: text.slice(close + 2).split(" "),
    };
  } catch {
    return null; // the process or thread ended meanwhile
  }
}

// After "pid (comm) ": [0] state, [2] process group, [11] utime, [12] stime, [16] nice.
export function threadTimes(processGroup: number): ThreadTime[] {
  let pids: string[];
  try {
    pids = readdirSync("/proc").filter((d) => /^\d+$/.test(d));
  } catch {
    return [];
  }
  const out: ThreadTime[] = [];
  for (const pid of pids) {
    const proc = statFields(`/proc/${pid}/stat`);
    if (!proc || Number(proc.fields[2]) !== processGroup) continue;
    let tids: string[] = [];
    try {
      tids = readdirSync(`/proc/${pid}/task`);
    } catch {}
    for (const tid of tids) {
      const t = statFields(`/proc/${pid}/task/${tid}/stat`);
      if (!t) continue;
      out.push({
        pid: Number(pid),
        tid: Number(tid),
        name: t.name,
        nice: Number(t.fields[16]),
        ticks: Number(t.fields[11]) + Number(t.fields[12]),
      });
    }
  }
  return out;
}

/** The threads that used the most CPU between two snapshots, one line each. */
export function busiestThreads(before: ThreadTime[], after: ThreadTime[], top = 12): string[] {
  const start = new Map(before.map((t) => [`${t.pid}/${t.tid}`, t.ticks]));
  return after
    .map((t) => ({ ...t, used: t.ticks - (start.get(`${t.pid}/${t.tid}`) ?? 0) }))
    .filter((t) => t.used > 0)
    .sort((a, b) => b.used - a.used)
    .slice(0, top)
    .map(
      (t) =>
        `  pid ${t.pid} thread ${t.tid} ${t.name.padEnd(16)} nice ${String(t.nice).padStart(3)}: ${(t.used / TICKS_PER_SECOND).toFixed(1)} s`,
    );
}
