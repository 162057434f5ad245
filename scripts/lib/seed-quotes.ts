// Demo quotes for Tallowmere Power Works (idempotent: only when the team has none): the mountain hut's
// quote sent to its warden (who can sign in and approve it), and the orchard pump's quote as a draft.
// Sending is recorded directly rather than mailed, because the mail fake is not running while seeding.
const EXTRA_COSTS: Record<string, string> = { labour: "45.00", mounting: "320.00", freight: "85.00" };

export async function seedDemoQuotes(log: (line: string) => void) {
  const { db } = await import("../../app/server/db.server");
  const { createQuoteFromPlan } = await import("../../app/server/quotes/quote-create.server");
  const { saveQuoteEdits } = await import("../../app/server/quotes/quote-save.server");
  const { findTeamQuote } = await import("../../app/server/quotes/quote-queries.server");
  const { changeQuoteStatus } = await import("../../app/server/quotes/quote-events.server");
  const { editorValues } = await import("../../app/server/quotes/quote-editor-values.server");
  const team = await db.selectFrom("organization").select("id").where("slug", "=", "tallowmere-power-works").executeTakeFirst();
  const owner = await db.selectFrom("user").select(["id", "name"]).where("email", "=", "maren@tallowmere.example").executeTakeFirst();
  if (!team || !owner) return;
  const existing = await db.selectFrom("quote").select("id").where("team_id", "=", team.id).executeTakeFirst();
  if (existing) return;
  const actor = { userId: owner.id, name: owner.name };
  const plans = await db
    .selectFrom("kit_plan")
    .innerJoin("site", "site.id", "kit_plan.site_id")
    .select(["kit_plan.id", "site.name as siteName"])
    .where("kit_plan.team_id", "=", team.id)
    .execute();
  for (const plan of plans.filter((p) => p.siteName !== "Fenmoor ranger station")) {
    const created = await createQuoteFromPlan(team.id, actor, plan.id);
    if (!created.ok) {
      log(`  (no demo quote for ${plan.siteName}: ${created.message})`);
      continue;
    }
    const found = (await findTeamQuote(team.id, created.quoteId))!;
    const values = editorValues(found.quote, found.revision);
    const form = {
      ...values,
      marginPct: "22",
      taxRatePct: "20",
      depositPct: "30",
      lines: values.lines.map((l) => (l.unitCost === "0" ? { ...l, unitCost: EXTRA_COSTS[l.kind] ?? "150.00" } : l)),
    };
    await saveQuoteEdits(team.id, actor, created.quoteId, form);
    if (found.quote.customer_email === "warden@vell-hut.example") {
      const warden = await db.selectFrom("user").select("id").where("email", "=", "warden@vell-hut.example").executeTakeFirstOrThrow();
      await db.transaction().execute(async (trx) => {
        await trx.updateTable("quote_revision").set({ sent_at: new Date() }).where("quote_id", "=", created.quoteId).where("revision", "=", 1).execute();
        await trx.updateTable("quote").set({ sent_revision: 1, customer_user_id: warden.id }).where("id", "=", created.quoteId).execute();
        await changeQuoteStatus(trx, "sent", {
          quoteId: created.quoteId,
          revision: 1,
          kind: "sent",
          actor,
          detail: "Revision 1 sent to Aurel Stroud <warden@vell-hut.example> (demo data).",
        });
      });
    }
    log(`quote for ${plan.siteName}`);
  }
}
