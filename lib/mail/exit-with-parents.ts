import { readFileSync } from "node:fs";

function parentOf(pid: number): number | null {
  try {
    // /proc/<pid>/stat: "pid (comm) state ppid …"; comm may hold spaces, so read after the last ")".
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    return Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]);
  } catch {
    return null;
  }
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

/**
 * Calls `stop` once any process that started this one (up to four levels: tsx, npx, the shell
 * script) has gone. The start and test scripts launch these helpers through npx and stop them by
 * killing the npx wrapper, which does not pass the signal on; without this they would outlive it.
 * Linux only (reads /proc); elsewhere it does nothing.
 */
export function exitWithParents(stop: () => void, everyMs = 1000): void {
  const ancestors: number[] = [];
  let pid = process.ppid;
  while (pid > 1 && ancestors.length < 4) {
    ancestors.push(pid);
    const next = parentOf(pid);
    if (next === null) break;
    pid = next;
  }
  if (ancestors.length === 0) return;
  const timer = setInterval(() => {
    if (ancestors.some((p) => !alive(p))) {
      clearInterval(timer);
      stop();
    }
  }, everyMs);
  timer.unref();
}
