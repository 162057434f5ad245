import { data, Link } from "react-router";
import type { Route } from "./+types/load-sheet-new";
import { LoadSheetEditor } from "~/components/loads/load-sheet-editor";
import { PageHeader } from "~/components/page-header";
import { parseLoadSheetForm } from "~/lib/load-sheet-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { inverterChoices, requireTeamSite } from "~/server/load-sheet-route.server";
import { createLoadSheet } from "~/server/load-sheets.server";

export const meta: Route.MetaFunction = () => [{ title: "New load sheet · Kitwright" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const { site } = await requireTeamSite(request, params.siteId);
  return { site: { id: site.id, name: site.name }, inverters: await inverterChoices() };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, team, site } = await requireTeamSite(request, params.siteId);
  const parsed = parseLoadSheetForm(await request.formData());
  if (!parsed.success) return data({ errors: parsed.fields }, { status: 400 });
  await createLoadSheet(team.teamId, site.id, user.id, parsed.data);
  return redirectWithFlash(`/sites/${site.id}`, { kind: "success", message: `Load sheet "${parsed.data.name}" saved.` });
}

export default function LoadSheetNew({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader
        title="New load sheet"
        lead={
          <>
            What the customer will run at{" "}
            <Link to={`/sites/${loaderData.site.id}`} className="underline">
              {loaderData.site.name}
            </Link>
            , and when.
          </>
        }
      />
      <LoadSheetEditor initialName="" initialRows={[]} inverters={loaderData.inverters} errors={actionData?.errors ?? {}} submitLabel="Save load sheet" />
    </>
  );
}
