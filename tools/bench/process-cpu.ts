import { execFileSync } from 'node:child_process';
import { readFileSync, readdirSync } from 'node:fs';

let ticksPerSecond: number | undefined;

/** The kernel's clock ticks per second, in which /proc counts CPU time. */
function clockTicksPerSecond(): number {
  ticksPerSecond ??= Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).trim());
  return ticksPerSecond;
}

/** One process's parent and its user + system CPU so far, in clock ticks (from /proc). */
function processStat(pid: number): { parent: number; ticks: number; command: string } | null {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    // The command sits in parentheses and may hold spaces; the fields after it are fixed.
    const close = stat.lastIndexOf(')');
    const fields = stat.slice(close + 2).split(' ');
    const command = readFileSync(`/proc/${pid}/cmdline`, 'utf8').replace(/\0/g, ' ');
    return { parent: Number(fields[1]), ticks: Number(fields[11]) + Number(fields[12]), command };
  } catch {
    return null; // ended meanwhile
  }
}

function allProcesses(): Map<number, { parent: number; ticks: number; command: string }> {
  const found = new Map<number, { parent: number; ticks: number; command: string }>();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    const stat = processStat(Number(entry));
    if (stat) found.set(Number(entry), stat);
  }
  return found;
}

/**
 * CPU seconds used so far by a process and all its descendants, and by every process whose
 * command line contains `pattern` — read from /proc, so Linux only (answers null elsewhere).
 * The bench uses it to split a sync round's CPU between server, database and client.
 */
export function cpuSeconds(
  tree: number,
  pattern: string,
): { tree: number; matching: number } | null {
  let processes: ReturnType<typeof allProcesses>;
  try {
    processes = allProcesses();
  } catch {
    return null;
  }
  const inTree = (pid: number): boolean => {
    for (let at = pid; at > 1; at = processes.get(at)?.parent ?? 0) if (at === tree) return true;
    return false;
  };
  let treeTicks = 0;
  let matchingTicks = 0;
  for (const [pid, stat] of processes) {
    if (inTree(pid)) treeTicks += stat.ticks;
    if (stat.command.includes(pattern)) matchingTicks += stat.ticks;
  }
  const hz = clockTicksPerSecond();
  return { tree: treeTicks / hz, matching: matchingTicks / hz };
}
