// One supplier: its details (editable) and its offers. Another team's supplier is not found.
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link } from "react-router";
import type { Route } from "./+types/sourcing.supplier";
import { PageHeader, Panel } from "~/components/page-header";
import { OfferList } from "~/components/sourcing/offer-list";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { SupplierFormView } from "~/components/sourcing/supplier-form";
import { supplierFormSchema } from "~/lib/sourcing-forms";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { offerJson } from "~/server/sourcing/offer-json.server";
import { listOffers } from "~/server/sourcing/offers.server";
import { deleteSupplier, findSupplier, isDuplicateName, supplierToForm, updateSupplier } from "~/server/sourcing/suppliers.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.supplier.name ?? "Supplier"} · Sourcing · Kitwright` }];

async function loadSupplier(request: Request, supplierId: string) {
  const { user, team } = await requireTeamMember(request);
  const supplier = await findSupplier(db, team.teamId, supplierId);
  // Another team's supplier and a made-up id look the same: not found.
  if (!supplier) throw new Response("No such supplier in your team.", { status: 404 });
  return { user, team, supplier };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team, supplier } = await loadSupplier(request, params.supplierId);
  const offers = await listOffers(db, team.teamId, { supplierId: supplier.id });
  return { supplier: { id: supplier.id, name: supplier.name, currency: supplier.currency }, form: supplierToForm(supplier), offers: offers.map(offerJson) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { team, supplier } = await loadSupplier(request, params.supplierId);
  const formData = await request.formData();
  if (formData.get("intent") === "delete") {
    await deleteSupplier(db, team.teamId, supplier.id);
    return redirectWithFlash("/sourcing", { kind: "info", message: `Supplier "${supplier.name}" deleted, with its offers.` });
  }
  const submission = parseWithZod(formData, { schema: supplierFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  try {
    await updateSupplier(db, team.teamId, supplier.id, submission.value);
  } catch (error) {
    if (!isDuplicateName(error)) throw error;
    return data({ result: submission.reply({ fieldErrors: { name: ["Your team already has a supplier of this name."] } }) }, { status: 400 });
  }
  return redirectWithFlash(`/sourcing/suppliers/${supplier.id}`, { kind: "success", message: "Supplier saved." });
}

export default function SupplierPage({ loaderData, actionData }: Route.ComponentProps) {
  const { supplier, offers } = loaderData;
  return (
    <>
      <PageHeader
        title={supplier.name}
        lead={`Prices in ${supplier.currency} unless an offer says otherwise.`}
        actions={
          <div className="flex flex-wrap gap-2">
            <Link to={`/sourcing/offers/new?supplierId=${supplier.id}`} className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
              New offer from {supplier.name}
            </Link>
            <Form method="post" onSubmit={(e) => (confirm(`Delete ${supplier.name} and its ${offers.length} offers?`) ? undefined : e.preventDefault())}>
              <input type="hidden" name="intent" value="delete" />
              <button type="submit" className="rounded-md border border-fail px-3 py-2 text-sm text-fail">
                Delete supplier
              </button>
            </Form>
          </div>
        }
      />
      <SourcingTabs />
      <div className="space-y-6">
        <Panel title={`Offers (${offers.length})`}>
          <OfferList offers={offers} showSupplier={false} />
        </Panel>
        <SupplierFormView key={supplier.id} lastResult={actionData?.result} submitLabel="Save changes" defaultValue={loaderData.form} />
      </div>
    </>
  );
}
