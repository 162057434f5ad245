// GET /api/v1/offers — the team's offers (team API key or signed-in installer). Query: kind
// (modules|batteries|controllers|inverters), supplierId, includeExpired (true by default; expired
// offers carry "expired": true), quantity (adds the landed cost for that many, in the offer's
// currency and in the team's quoting currency with the rate used). Money is decimal text.
import type { Route } from "./+types/api.v1.offers";
import { isOfferPartKind } from "~/domain/sourcing/offer-facts";
import { db } from "~/server/db.server";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { landedJson, offerJson } from "~/server/sourcing/offer-json.server";
import { listOffers } from "~/server/sourcing/offers.server";
import { loadTeamPricing } from "~/server/sourcing/settings.server";

export async function loader({ request }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const url = new URL(request.url);
  const fields: Record<string, string> = {};
  const kind = url.searchParams.get("kind");
  if (kind !== null && !isOfferPartKind(kind)) fields.kind = "Use modules, batteries, controllers or inverters.";
  const includeExpired = url.searchParams.get("includeExpired") ?? "true";
  if (includeExpired !== "true" && includeExpired !== "false") fields.includeExpired = "Use true or false.";
  const quantityText = url.searchParams.get("quantity");
  const quantity = quantityText === null ? null : Number(quantityText);
  if (quantityText !== null && (!/^\d+$/.test(quantityText) || quantity! < 1 || quantity! > 1_000_000)) fields.quantity = "A whole number from 1 to 1000000.";
  if (Object.keys(fields).length) return jsonError(400, "The query needs corrections.", fields);

  const pricing = await loadTeamPricing(db, teamId);
  const offers = await listOffers(db, teamId, {
    partKind: isOfferPartKind(kind) ? kind : undefined,
    supplierId: url.searchParams.get("supplierId") ?? undefined,
    asOf: pricing.asOf,
    validOnly: includeExpired === "false",
  });
  const items = offers.map((o) => {
    if (quantity === null) return offerJson(o);
    return {
      ...offerJson(o),
      landed: landedJson(o.terms, quantity, pricing),
    };
  });
  return Response.json({ items, total: items.length, quotingCurrency: pricing.quotingCurrency, asOf: pricing.asOf });
}
