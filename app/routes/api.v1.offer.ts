// GET /api/v1/offers/:offerId — one of the team's offers (another team's id answers 404), with the
// landed cost for ?quantity= in the offer's currency and the quoting currency, as in the list.
import type { Route } from "./+types/api.v1.offer";
import { db } from "~/server/db.server";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { landedJson, offerJson } from "~/server/sourcing/offer-json.server";
import { findOffer } from "~/server/sourcing/offers.server";
import { loadTeamPricing } from "~/server/sourcing/settings.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const quantityText = new URL(request.url).searchParams.get("quantity");
  if (quantityText !== null && (!/^\d+$/.test(quantityText) || Number(quantityText) < 1 || Number(quantityText) > 1_000_000)) {
    return jsonError(400, "The query needs corrections.", { quantity: "A whole number from 1 to 1000000." });
  }
  const pricing = await loadTeamPricing(db, teamId);
  const offer = await findOffer(db, teamId, params.offerId, pricing.asOf);
  if (!offer) return jsonError(404, "No such offer in your team.");
  if (quantityText === null) return Response.json(offerJson(offer));
  return Response.json({
    ...offerJson(offer),
    landed: landedJson(offer.terms, Number(quantityText), pricing),
  });
}
