// A new quote from a saved kit plan: the plan's parts at the team's cheapest valid offers, the usual
// labour, mounting and freight lines, and the team's figures from its previous quote (or the starting
// defaults). Refused while the plan has a failing safety check without an accepted reason.
import { db } from "../db.server";
import { findPlan } from "../plans/plans.server";
import { findBatteryPart, findControllerPart, findInverterPart, findModulePart } from "../plans/catalogue-parts.server";
import { findSite } from "../sites.server";
import { loadTeamPricing } from "../sourcing/settings.server";
import { recordQuoteEvent, type Executor, type QuoteActor } from "./quote-events.server";
import { cheapestOffer } from "./offer-picks.server";
import { insertRevision, type RevisionContent } from "./quote-revisions.server";
import { cablingLine, partLine, partNeeds, startingExtraLines } from "~/domain/quotes/plan-lines";
import { planBlockers, snapshotFromPlan } from "~/domain/quotes/plan-snapshot";
import { addDaysIso } from "~/domain/quotes/quote-dates";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { planChoicesSchema } from "~/lib/plan-choices";

export const STARTING_TERMS =
  "Prices include the parts and work listed. The deposit confirms the order; the balance is due when the system is handed over. " +
  "The design follows the local electrical code and is installed and signed off by a licensed person.";

export type CreateQuoteOutcome = { ok: true; quoteId: string } | { ok: false; status: number; message: string };

async function previousFigures(trx: Executor, teamId: string) {
  return trx
    .selectFrom("quote_revision")
    .innerJoin("quote", "quote.id", "quote_revision.quote_id")
    .select(["quote_revision.margin_pct", "quote_revision.discount_pct", "quote_revision.tax_rate_pct", "quote_revision.deposit_pct", "quote_revision.terms"])
    .where("quote.team_id", "=", teamId)
    .orderBy("quote_revision.created_at", "desc")
    .executeTakeFirst();
}

async function partLabels(ids: { moduleId: string; controllerId: string; batteryId: string; inverterId: string | null }) {
  const [m, c, b, i] = await Promise.all([
    findModulePart(ids.moduleId),
    findControllerPart(ids.controllerId),
    findBatteryPart(ids.batteryId),
    ids.inverterId ? findInverterPart(ids.inverterId) : null,
  ]);
  return Object.fromEntries([m, c, b, i].filter((p) => p !== null).map((p) => [p!.id, p!.label]));
}

export async function createQuoteFromPlan(teamId: string, actor: QuoteActor, planId: string): Promise<CreateQuoteOutcome> {
  const found = await findPlan(teamId, planId);
  if (!found) return { ok: false, status: 404, message: "There is no such kit plan in your team." };
  const { plan, revision } = found;
  const blockers = planBlockers(revision.result, revision.overrides);
  if (blockers.length) {
    return {
      ok: false,
      status: 409,
      message: `This plan fails a safety check (${blockers.join("; ")}). Fix the design, or record why the check is accepted, before quoting it.`,
    };
  }
  const choices = planChoicesSchema.safeParse(revision.choices);
  if (!choices.success) return { ok: false, status: 409, message: "The plan's saved choices no longer read as a plan: open and save it again." };
  const site = await findSite(teamId, plan.site_id);
  const labels = await partLabels(choices.data);
  const snapshot = snapshotFromPlan(revision.result, {
    planName: plan.name,
    planRevision: revision.revision,
    siteName: site?.name ?? "",
    autonomyDays: choices.data.design.autonomyDays,
    overrides: revision.overrides,
  });

  const quoteId = await db.transaction().execute(async (trx) => {
    // One quote number at a time per team: the team row is the lock.
    await trx.selectFrom("organization").select("id").where("id", "=", teamId).forUpdate().executeTakeFirstOrThrow();
    const pricing = await loadTeamPricing(trx, teamId);
    const lines = [];
    for (const need of partNeeds(revision.result, choices.data, labels)) lines.push(partLine(need, await cheapestOffer(trx, teamId, need, pricing)));
    const cabling = cablingLine(revision.result);
    if (cabling) lines.push(cabling);
    lines.push(...startingExtraLines());
    const last = await previousFigures(trx, teamId);
    const { max } = await trx
      .selectFrom("quote")
      .select((eb) => eb.fn.max("number").as("max"))
      .where("team_id", "=", teamId)
      .executeTakeFirstOrThrow();
    const quote = await trx
      .insertInto("quote")
      .values({
        team_id: teamId,
        number: (max ?? 0) + 1,
        plan_id: plan.id,
        title: `Off-grid kit for ${site?.name ?? plan.name}`,
        customer_name: site?.customer_name ?? "",
        customer_email: site?.customer_email ?? "",
        currency: pricing.quotingCurrency,
        created_by: actor.userId,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    const content: RevisionContent = {
      defaults: { marginPct: last?.margin_pct ?? "25", discountPct: last?.discount_pct ?? "0", taxRatePct: last?.tax_rate_pct ?? "0" },
      depositPct: last?.deposit_pct ?? "30",
      validUntil: addDaysIso(todayIso(), 30),
      terms: last?.terms || STARTING_TERMS,
      note: `Priced from plan revision ${revision.revision}.`,
      lines,
    };
    await insertRevision(trx, {
      quoteId: quote.id,
      revision: 1,
      planRevision: revision.revision,
      currency: pricing.quotingCurrency,
      snapshot,
      userId: actor.userId,
      content,
    });
    await recordQuoteEvent(trx, {
      quoteId: quote.id,
      revision: 1,
      kind: "created",
      actor,
      detail: `From kit plan "${plan.name}", revision ${revision.revision}.`,
    });
    return quote.id;
  });
  return { ok: true, quoteId };
}
