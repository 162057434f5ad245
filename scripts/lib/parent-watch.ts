// Stops the local stack when whatever started it goes away without a signal reaching us: `kill -TERM`
// to npm ends npm and its `sh`, but not tsx or this process. Watching only our parent is not enough,
// because tsx and `sh -c` sit between npm and us; so we watch the chain of launcher processes (tsx,
// sh -c, npm) below the first real parent. A change in any of their parents means one of them ended.
import { readFileSync } from "node:fs";

function parentOf(pid: number): number | null {
  try {
    // /proc/<pid>/stat: "pid (comm) state ppid …"; comm may hold spaces and parentheses.
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    return Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]);
  } catch {
    return null;
  }
}

function isLauncher(pid: number) {
  try {
    const argv = readFileSync(`/proc/${pid}/cmdline`, "utf8").split("\0");
    const command = argv.join(" ");
    return /(^|\/)(sh|bash|dash) -c /.test(command) || /node_modules\/\.bin\/tsx|\/tsx\/dist\/cli|(^|\/)npm( |$)|npm-cli\.js/.test(command);
  } catch {
    return false;
  }
}

/**
 * Our launcher ancestors (tsx, sh -c, npm), from our parent up. The first real parent — the user's
 * shell, a process manager — is left out on purpose: `nohup npm start &` must survive that shell's
 * exit, and a closing terminal reaches us as SIGHUP anyway.
 */
export function launcherChain(): number[] {
  const chain: number[] = [];
  let pid: number | null = process.ppid;
  while (pid && pid > 1 && chain.length < 8 && isLauncher(pid)) {
    chain.push(pid);
    pid = parentOf(pid);
  }
  return chain;
}

/** Calls `onGone` (once) when any process in the launcher chain ends; checks once a second. */
export function watchLaunchers(onGone: (why: string) => void) {
  // When a process ends, its children are re-parented: a changed parent anywhere in the chain means
  // that a process of the chain ended.
  const chain = launcherChain();
  if (!chain.length) return () => {};
  const timer = setInterval(() => {
    if (process.ppid !== chain[0]) return stop(`its parent process ${chain[0]} ended`);
    for (let i = 1; i < chain.length; i++) {
      if (parentOf(chain[i - 1]) !== chain[i]) return stop(`the process that started it (${chain[i]}) ended`);
    }
  }, 1000);
  timer.unref();
  function stop(why: string) {
    clearInterval(timer);
    onGone(why);
  }
  return () => clearInterval(timer);
}
