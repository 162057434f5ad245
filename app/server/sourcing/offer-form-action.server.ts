// What the new-offer and edit-offer pages share: the choices their form offers, and saving a
// submitted form with messages at the fields (another team's supplier is refused like a made-up one).
import type { SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import type { Executor } from "./executor.server";
import { createOffer, isDuplicateOffer, offerValuesFromForm, updateOffer } from "./offer-write.server";
import { findPart, listPartChoices } from "./part-figures.server";
import { findSupplier } from "./suppliers.server";
import { OFFER_PART_KINDS } from "~/domain/sourcing/offer-facts";
import { offerFormSchema } from "~/lib/sourcing-forms";
import type { OfferFormChoices } from "~/components/sourcing/offer-form";
import { isUuid } from "../modules.server";

export async function loadOfferChoices(db: Executor, teamId: string): Promise<OfferFormChoices> {
  const [suppliers, ...parts] = await Promise.all([
    db
      .selectFrom("supplier")
      .select(["id", "name", "currency", "default_shipping_per_unit", "default_shipping_per_order", "default_lead_time_days"])
      .where("team_id", "=", teamId)
      .orderBy("name")
      .execute(),
    ...OFFER_PART_KINDS.map((k) => listPartChoices(db, k)),
  ]);
  return {
    suppliers: suppliers.map((s) => ({
      id: s.id,
      name: s.name,
      currency: s.currency,
      defaultShippingPerUnit: s.default_shipping_per_unit,
      defaultShippingPerOrder: s.default_shipping_per_order,
      defaultLeadTimeDays: s.default_lead_time_days,
    })),
    parts: Object.fromEntries(OFFER_PART_KINDS.map((k, i) => [k, parts[i]])) as OfferFormChoices["parts"],
  };
}

export type OfferSaveOutcome = { ok: false; reply: SubmissionResult<string[]> } | { ok: true; id: string; created: boolean };

/** Saves a new offer, or `existing` (whose part may have been merged since: keeping it is allowed). */
export async function saveOfferForm(
  db: Executor,
  teamId: string,
  userId: string | null,
  formData: FormData,
  existing?: { id: string; partId: string },
): Promise<OfferSaveOutcome> {
  const submission = parseWithZod(formData, { schema: offerFormSchema });
  if (submission.status !== "success") return { ok: false, reply: submission.reply() };
  const form = submission.value;
  const supplier = await findSupplier(db, teamId, form.supplierId);
  if (!supplier) return { ok: false, reply: submission.reply({ fieldErrors: { supplierId: ["Choose one of your team's suppliers."] } }) };
  const part = isUuid(form.partId) ? await findPart(db, form.partKind, form.partId) : undefined;
  if (!part) return { ok: false, reply: submission.reply({ fieldErrors: { partId: ["That part is not in the catalogue: choose it from the list."] } }) };
  if (part.merged_into && part.id !== existing?.partId) {
    return {
      ok: false,
      reply: submission.reply({ fieldErrors: { partId: [`${part.maker} ${part.model} was merged into another model in the catalogue: choose that one.`] } }),
    };
  }
  const values = offerValuesFromForm(form, supplier);
  try {
    if (existing) {
      const updated = await updateOffer(db, teamId, existing.id, values);
      if (!updated) throw new Response("No such offer in your team.", { status: 404 });
      return { ok: true, id: existing.id, created: false };
    }
    return { ok: true, id: await createOffer(db, teamId, userId, values), created: true };
  } catch (error) {
    if (!isDuplicateOffer(error)) throw error;
    return {
      ok: false,
      reply: submission.reply({ fieldErrors: { partId: [`${supplier.name} already has an offer for ${part.maker} ${part.model}: edit that one instead.`] } }),
    };
  }
}
