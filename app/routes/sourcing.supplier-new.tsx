import { parseWithZod } from "@conform-to/zod/v4";
import { data } from "react-router";
import type { Route } from "./+types/sourcing.supplier-new";
import { PageHeader } from "~/components/page-header";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { SupplierFormView } from "~/components/sourcing/supplier-form";
import { supplierFormSchema } from "~/lib/sourcing-forms";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { createSupplier, isDuplicateName } from "~/server/sourcing/suppliers.server";
import { getQuotingCurrency } from "~/server/sourcing/settings.server";

export const meta: Route.MetaFunction = () => [{ title: "New supplier · Sourcing · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  return { currency: (await getQuotingCurrency(db, team.teamId)).currency };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const submission = parseWithZod(await request.formData(), { schema: supplierFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  try {
    const id = await createSupplier(db, team.teamId, user.id, submission.value);
    return redirectWithFlash(`/sourcing/suppliers/${id}`, { kind: "success", message: `Supplier "${submission.value.name}" added.` });
  } catch (error) {
    if (!isDuplicateName(error)) throw error;
    return data({ result: submission.reply({ fieldErrors: { name: ["Your team already has a supplier of this name."] } }) }, { status: 400 });
  }
}

export default function SupplierNew({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="New supplier" lead="Who sells to you, in which currency, and how they usually ship." />
      <SourcingTabs />
      <SupplierFormView lastResult={actionData?.result} submitLabel="Add supplier" defaultValue={{ currency: loaderData.currency }} />
    </>
  );
}
