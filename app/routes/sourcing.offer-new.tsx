import { data, Link } from "react-router";
import type { Route } from "./+types/sourcing.offer-new";
import { PageHeader } from "~/components/page-header";
import { OfferFormView } from "~/components/sourcing/offer-form";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { isOfferPartKind } from "~/domain/sourcing/offer-facts";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { loadOfferChoices, saveOfferForm } from "~/server/sourcing/offer-form-action.server";

export const meta: Route.MetaFunction = () => [{ title: "New offer · Sourcing · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const url = new URL(request.url);
  const choices = await loadOfferChoices(db, team.teamId);
  const supplierId = url.searchParams.get("supplierId");
  const kind = url.searchParams.get("kind");
  const partId = url.searchParams.get("partId");
  return {
    choices,
    defaults: {
      // Only the team's own supplier ids are taken from the URL.
      supplierId: choices.suppliers.some((s) => s.id === supplierId) ? supplierId! : undefined,
      partKind: isOfferPartKind(kind) ? kind : "modules",
      partId: partId ?? undefined,
    },
  };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const outcome = await saveOfferForm(db, team.teamId, user.id, await request.formData());
  if (!outcome.ok) return data({ result: outcome.reply }, { status: 400 });
  return redirectWithFlash(`/sourcing/offers/${outcome.id}`, { kind: "success", message: "Offer saved." });
}

export default function OfferNew({ loaderData, actionData }: Route.ComponentProps) {
  const { choices, defaults } = loaderData;
  return (
    <>
      <PageHeader title="New offer" lead="A supplier's price for one catalogue part, with its breaks, order terms and how long it holds." />
      <SourcingTabs />
      {choices.suppliers.length === 0 ? (
        <p className="mb-4 rounded-md bg-warn-wash px-3 py-2 text-sm text-warn">
          <span aria-hidden="true">⚠</span> Add a supplier first:{" "}
          <Link to="/sourcing/suppliers/new" className="underline">
            new supplier
          </Link>
          , or import a price list.
        </p>
      ) : null}
      <OfferFormView lastResult={actionData?.result} submitLabel="Save offer" choices={choices} defaultValue={defaults} />
    </>
  );
}
