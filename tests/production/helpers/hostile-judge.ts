// What counts as a good answer to a hostile request: never a 5xx; the status the case allows (any
// 4xx by default); for /api/* a JSON body with an error message; for pages an HTML page (the form
// again with its messages, or the error page) or the front door's plain-text refusal; no stored or
// echoed markup left unescaped; and no table changed except those the case names.
import type { HostileCase } from "./hostile-corpus";
import type { RawAnswer } from "./hostile-http";
import { changedTables, type RowCounts } from "./row-counts";

const RAW_MARKUP = ["<script>alert(1)</script>", "<img src=x onerror=alert(1)>"];

export function judge(c: HostileCase, answer: RawAnswer, before: RowCounts, after: RowCounts): string[] {
  const problems: string[] = [];
  const { status } = answer;
  const type = String(answer.headers["content-type"] ?? "");
  if (status >= 500) problems.push(`answered ${status}`);
  else if (Array.isArray(c.expect) ? !c.expect.includes(status) : c.expect === "not5xx" ? false : status < 400 || status >= 500)
    problems.push(`answered ${status}, expected ${Array.isArray(c.expect) ? c.expect.join("/") : "a 4xx"}`);

  const path = c.path.split("?")[0];
  if (status >= 400 && status < 500) {
    if (path.startsWith("/api/")) problems.push(...jsonErrorProblems(answer, type, path.startsWith("/api/auth/")));
    else if (!/text\/html|text\/plain/.test(type)) problems.push(`page answered with Content-Type ${type || "(none)"}`);
    else if (type.includes("text/html") && !answer.body.includes("</html>")) problems.push("HTML answer is not a whole page");
    else if (type.includes("text/html") && status === 400 && !hasMessage(answer.body)) problems.push("400 page shows no message");
  }
  if (c.expectText && !c.expectText.test(answer.body)) problems.push(`answer does not say ${c.expectText}`);
  // A body refused for its size says so; a request whose only fault is unstorable text says which.
  if (status === 413 && !/larger than|at most|too large/i.test(answer.body)) problems.push("413 without saying what is too large");
  if (/otherwise valid/.test(c.label) && !/NUL character|unpaired surrogate/.test(answer.body)) problems.push("does not name the unstorable character");
  if (type.includes("text/html")) for (const raw of RAW_MARKUP) if (answer.body.includes(raw)) problems.push(`HTML contains raw ${raw}`);
  const changed = changedTables(before, after, new Set(c.mayWrite ?? []));
  if (changed.length) problems.push(`wrote rows: ${changed.join(", ")}`);
  return problems;
}

function jsonErrorProblems(answer: RawAnswer, type: string, betterAuth: boolean): string[] {
  if (!type.includes("application/json")) return [`API answered with Content-Type ${type || "(none)"}`];
  try {
    const body = JSON.parse(answer.body) as { error?: { message?: unknown }; message?: unknown };
    // better-auth's own endpoints answer { code, message }; ours { error: { message, fields? } }.
    const message = betterAuth ? (body.error?.message ?? body.message) : body.error?.message;
    return typeof message === "string" && message.trim() ? [] : [`API error without a message: ${answer.body.slice(0, 120)}`];
  } catch {
    return [`API answer is not JSON: ${answer.body.slice(0, 120)}`];
  }
}

/**
 * A field message (✕ beside a field), a form-level alert, the form shown again, or the error page
 * of a request refused before its route (app/server/request-limits.server.ts) with its reason.
 */
function hasMessage(html: string) {
  return html.includes("✕") || html.includes('role="alert"') || html.includes("<form") || html.includes("Kitwright could not use what was sent");
}
