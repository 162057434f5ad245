// One offer: what it costs at the quantities where its price changes (in its currency and in the
// team's, with the rate), and the form to change or delete it. Another team's offer is not found.
import { data, Form } from "react-router";
import type { Route } from "./+types/sourcing.offer";
import { PageHeader, Panel } from "~/components/page-header";
import { ExpiryStatus } from "~/components/sourcing/expiry-status";
import { LandedPreview } from "~/components/sourcing/landed-preview";
import { OfferFormView } from "~/components/sourcing/offer-form";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { costOffer } from "~/domain/sourcing/offer-costing";
import { moneyText, rateText, roundedText } from "~/domain/sourcing/comparison-rows";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { loadOfferChoices, saveOfferForm } from "~/server/sourcing/offer-form-action.server";
import { deleteOffer, findOffer } from "~/server/sourcing/offers.server";
import { loadTeamPricing } from "~/server/sourcing/settings.server";
import { KIND_CSV_WORD } from "~/lib/sourcing-csv";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.title ?? "Offer"} · Sourcing · Kitwright` }];

async function loadOffer(request: Request, offerId: string) {
  const { user, team } = await requireTeamMember(request);
  const offer = await findOffer(db, team.teamId, offerId);
  if (!offer) throw new Response("No such offer in your team.", { status: 404 });
  return { user, team, offer };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team, offer } = await loadOffer(request, params.offerId);
  const [choices, pricing] = await Promise.all([loadOfferChoices(db, team.teamId), loadTeamPricing(db, team.teamId)]);
  const quantities = [...new Set([1, offer.terms.minimumOrder, ...offer.terms.breaks.map((b) => b.minQuantity)])].sort((a, b) => a - b);
  const preview = quantities.map((q) => {
    const c = costOffer(offer.terms, q, pricing);
    return {
      quantity: q,
      bought: c.landed.quantityBought,
      unitPrice: moneyText(c.landed.unitPrice),
      goods: roundedText(c.landed.goods),
      shipping: roundedText(c.landed.shipping),
      total: roundedText(c.landed.total),
      totalQuoting: c.totalQuoting ? roundedText(c.totalQuoting) : null,
      rate: rateText(c.rate),
      missingRate: c.missingRate,
    };
  });
  const title = offer.maker ? `${offer.maker} ${offer.model} from ${offer.supplierName}` : `Offer from ${offer.supplierName}`;
  return {
    title,
    kindWord: KIND_CSV_WORD[offer.partKind],
    offer: { id: offer.id, supplierId: offer.supplierId, supplierName: offer.supplierName, validUntil: offer.validUntil, expired: offer.expired },
    quotingCurrency: pricing.quotingCurrency,
    asOf: pricing.asOf,
    preview,
    choices,
    form: {
      supplierId: offer.supplierId,
      partKind: offer.partKind,
      partId: offer.partId,
      sku: offer.sku,
      currency: offer.terms.currency,
      unitPrice: offer.text.unitPrice,
      priceBreaks: offer.text.priceBreaks.map((b) => ({ minQuantity: b.minQuantity, unitPrice: b.unitPrice })),
      minimumOrder: offer.terms.minimumOrder,
      shippingPerUnit: offer.text.shippingPerUnit,
      shippingPerOrder: offer.text.shippingPerOrder,
      leadTimeDays: offer.leadTimeDays ?? undefined,
      stock: offer.stock ?? undefined,
      validUntil: offer.validUntil ?? undefined,
      notes: offer.notes,
    },
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, team, offer } = await loadOffer(request, params.offerId);
  const formData = await request.formData();
  if (formData.get("intent") === "delete") {
    await deleteOffer(db, team.teamId, offer.id);
    return redirectWithFlash(`/sourcing/suppliers/${offer.supplierId}`, { kind: "info", message: "Offer deleted." });
  }
  const outcome = await saveOfferForm(db, team.teamId, user.id, formData, { id: offer.id, partId: offer.partId });
  if (!outcome.ok) return data({ result: outcome.reply }, { status: 400 });
  return redirectWithFlash(`/sourcing/offers/${offer.id}`, { kind: "success", message: "Offer saved." });
}

export default function OfferPage({ loaderData, actionData }: Route.ComponentProps) {
  const { offer } = loaderData;
  return (
    <>
      <PageHeader
        title={loaderData.title}
        lead={
          <>
            A {loaderData.kindWord} offer. <ExpiryStatus validUntil={offer.validUntil} expired={offer.expired} />
          </>
        }
        actions={
          <Form method="post" onSubmit={(e) => (confirm("Delete this offer?") ? undefined : e.preventDefault())}>
            <input type="hidden" name="intent" value="delete" />
            <button type="submit" className="rounded-md border border-fail px-3 py-2 text-sm text-fail">
              Delete offer
            </button>
          </Form>
        }
      />
      <SourcingTabs />
      <div className="space-y-6">
        {offer.expired ? (
          <p className="rounded-md bg-warn-wash px-3 py-2 text-sm text-warn" role="note">
            <span aria-hidden="true">⚠</span> This price expired on {offer.validUntil}. It is kept for your records and left out of comparisons; ask the
            supplier for a new price and change the date.
          </p>
        ) : null}
        <Panel title="What it costs, landed">
          <LandedPreview rows={loaderData.preview} quotingCurrency={loaderData.quotingCurrency} asOf={loaderData.asOf} />
        </Panel>
        <OfferFormView key={offer.id} lastResult={actionData?.result} submitLabel="Save changes" choices={loaderData.choices} defaultValue={loaderData.form} />
      </div>
    </>
  );
}
