// The action behind every approve/reject button (the queue's cards, its bulk form and a reading's
// own page). Only curators decide.
import { parseWithZod } from "@conform-to/zod/v4";
import { data } from "react-router";
import { redirectWithFlash } from "../flash.server";
import { requireRole } from "../guards.server";
import { decideReadings } from "./moderation.server";
import { bulkDecisionSchema, decisionSchema, DEFAULT_APPROVAL_REASON } from "~/lib/reading-forms";

function plural(count: number, word: string) {
  return `${count} ${word}${count === 1 ? "" : "s"}`;
}

export async function handleDecisionAction(request: Request, options: { redirectTo: (readingIds: string[]) => string; onlyPending: boolean }) {
  const curator = await requireRole(request, "curator");
  const formData = await request.formData();
  const schema = formData.get("intent") === "bulk" ? bulkDecisionSchema : decisionSchema;
  const submission = parseWithZod(formData, { schema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const value = submission.value;
  const readingIds = value.intent === "bulk" ? value.readingIds : [value.readingId];
  const reason = value.reason || DEFAULT_APPROVAL_REASON;
  const outcome = await decideReadings({ curatorId: curator.id, readingIds, decision: value.decision, reason, onlyPending: options.onlyPending });

  if (outcome.decided.length === 0) {
    const why = outcome.skipped.some((s) => s.status === "missing")
      ? "That reading no longer exists."
      : `Nothing changed: ${readingIds.length === 1 ? "the reading is" : "the readings are"} already ${outcome.skipped.map((s) => s.status).join(", ")}.`;
    return data({ result: submission.reply({ formErrors: [why] }) }, { status: 409 });
  }
  const verb = value.decision === "approved" ? "Approved" : "Rejected";
  const skipped = outcome.skipped.length
    ? ` ${plural(outcome.skipped.length, "reading")} had already been decided and ${outcome.skipped.length === 1 ? "was" : "were"} left as they were.`
    : "";
  return redirectWithFlash(options.redirectTo(readingIds), {
    kind: "success",
    message: `${verb} ${plural(outcome.decided.length, "reading")}; the submitter${outcome.decided.length === 1 ? " is" : "s are"} told by e-mail.${skipped}`,
  });
}
