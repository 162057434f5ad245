// Saving the editor: an unsent draft revision is rewritten in place; once a revision has been sent it
// is never changed again, and the edit becomes the next revision (the customer keeps reading the sent
// one until the new one is sent).
import { db } from "../db.server";
import { recordQuoteEvent, type QuoteActor } from "./quote-events.server";
import { insertRevision, replaceDraftRevision, type RevisionContent } from "./quote-revisions.server";
import type { EnteredLine } from "~/domain/quotes/quote-lines";
import { STATUS_LABELS, teamCanRevise } from "~/domain/quotes/quote-status";
import type { QuotePlanSnapshot } from "~/domain/quotes/quote-types";
import type { QuoteEditorForm } from "~/lib/quote-forms";

export type SaveOutcome = { ok: true; revision: number; newRevision: boolean } | { ok: false; status: number; message: string };

export function formToContent(form: QuoteEditorForm): RevisionContent {
  const lines: EnteredLine[] = form.lines.map((l) => ({
    kind: l.kind,
    description: l.description,
    quantity: l.quantity,
    unitCost: l.unitCost,
    marginPct: l.marginPct ?? null,
    discountPct: l.discountPct ?? null,
    taxRatePct: l.taxRatePct ?? null,
    partKind: l.partKind ?? null,
    partId: l.partId ?? null,
    offerId: l.offerId ?? null,
  }));
  return {
    defaults: { marginPct: form.marginPct, discountPct: form.discountPct, taxRatePct: form.taxRatePct },
    depositPct: form.depositPct,
    validUntil: form.validUntil,
    terms: form.terms ?? "",
    note: form.note ?? "",
    lines,
  };
}

export async function saveQuoteEdits(teamId: string, actor: QuoteActor, quoteId: string, form: QuoteEditorForm): Promise<SaveOutcome | null> {
  return db.transaction().execute(async (trx) => {
    const quote = await trx.selectFrom("quote").selectAll().where("team_id", "=", teamId).where("id", "=", quoteId).forUpdate().executeTakeFirst();
    if (!quote) return null;
    if (!teamCanRevise(quote.status)) {
      return {
        ok: false,
        status: 409,
        message: `This quote is ${STATUS_LABELS[quote.status].toLowerCase()}: it can no longer be changed. Make a new quote from the plan instead.`,
      };
    }
    const latest = await trx
      .selectFrom("quote_revision")
      .select(["id", "revision", "plan_revision", "plan_snapshot", "sent_at"])
      .where("quote_id", "=", quote.id)
      .where("revision", "=", quote.latest_revision)
      .executeTakeFirstOrThrow();
    const offerIds = [...new Set(form.lines.flatMap((l) => (l.offerId ? [l.offerId] : [])))];
    if (offerIds.length) {
      const own = await trx.selectFrom("offer").select("id").where("team_id", "=", teamId).where("id", "in", offerIds).execute();
      const foreign = form.lines.findIndex((l) => l.offerId && !own.some((o) => o.id === l.offerId));
      if (foreign >= 0) return { ok: false, status: 400, message: `Line ${foreign + 1} names an offer that is not one of your team's.` };
    }
    const content = formToContent(form);
    const common = {
      quoteId: quote.id,
      planRevision: latest.plan_revision,
      currency: quote.currency,
      snapshot: latest.plan_snapshot as QuotePlanSnapshot,
      userId: actor.userId,
      content,
    };
    const emailChanged = quote.customer_email.toLowerCase() !== form.customerEmail.toLowerCase();
    await trx
      .updateTable("quote")
      .set({
        title: form.title,
        customer_name: form.customerName,
        customer_email: form.customerEmail,
        // A new address is a new reader: the next send finds or creates that account.
        ...(emailChanged ? { customer_user_id: null, access_token_hash: null } : {}),
        updated_at: new Date(),
      })
      .where("id", "=", quote.id)
      .execute();
    if (latest.sent_at === null) {
      await replaceDraftRevision(trx, { ...common, revisionId: latest.id, revision: latest.revision });
      return { ok: true, revision: latest.revision, newRevision: false };
    }
    const next = latest.revision + 1;
    await insertRevision(trx, { ...common, revision: next });
    await trx.updateTable("quote").set({ latest_revision: next }).where("id", "=", quote.id).execute();
    await recordQuoteEvent(trx, {
      quoteId: quote.id,
      revision: next,
      kind: "revised",
      actor,
      detail: form.note || `Revision ${next} started from revision ${latest.revision}.`,
    });
    return { ok: true, revision: next, newRevision: true };
  });
}
