// The app server's memory, read from outside the process: resident set and anonymous memory from
// /proc/<pid>/status, and the V8 heap from a Node diagnostic report that the server writes when sent
// SIGUSR2 (the bench starts it with the NODE_OPTIONS below; no endpoint is involved, and no report is
// asked for while a load runs).
import { mkdirSync, readdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";

export interface ServerMemory {
  rssMb: number;
  /** Anonymous resident memory: the JS heap plus native allocations. */
  anonMb: number;
  /** Bytes in use on the V8 heap (live objects and not yet collected garbage); null if no report came. */
  heapUsedMb: number | null;
}

const REPORT_DIR = `/tmp/kitwright-bench-reports-${process.pid}`;
const MB = 1024 * 1024;

/** Options for the app server so that SIGUSR2 makes it write a compact diagnostic report. */
export function memoryReportNodeOptions() {
  return [process.env.NODE_OPTIONS ?? "", "--report-on-signal", "--report-signal=SIGUSR2", "--report-compact", `--report-directory=${REPORT_DIR}`]
    .join(" ")
    .trim();
}

function statusKb(status: string, field: string) {
  const match = status.match(new RegExp(`^${field}:\\s+(\\d+) kB`, "m"));
  return match ? Number(match[1]) : NaN;
}

async function heapUsedMb(pid: number): Promise<number | null> {
  mkdirSync(REPORT_DIR, { recursive: true });
  const before = new Set(readdirSync(REPORT_DIR));
  process.kill(pid, "SIGUSR2");
  for (let waited = 0; waited < 5000; waited += 50) {
    await new Promise((r) => setTimeout(r, 50));
    const file = readdirSync(REPORT_DIR).find((name) => !before.has(name) && name.endsWith(".json"));
    if (!file) continue;
    try {
      const report = JSON.parse(readFileSync(path.join(REPORT_DIR, file), "utf8")) as { javascriptHeap?: { usedMemory?: number } };
      rmSync(path.join(REPORT_DIR, file));
      return typeof report.javascriptHeap?.usedMemory === "number" ? report.javascriptHeap.usedMemory / MB : null;
    } catch {
      // The report is still being written: read it on the next turn.
    }
  }
  return null;
}

export async function readServerMemory(pid: number): Promise<ServerMemory> {
  const heap = await heapUsedMb(pid);
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  return { rssMb: statusKb(status, "VmRSS") / 1024, anonMb: statusKb(status, "RssAnon") / 1024, heapUsedMb: heap };
}

export function removeMemoryReports() {
  rmSync(REPORT_DIR, { recursive: true, force: true });
}
