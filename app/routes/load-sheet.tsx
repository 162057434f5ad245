import { data, Form, Link } from "react-router";
import type { Route } from "./+types/load-sheet";
import { LoadSheetEditor } from "~/components/loads/load-sheet-editor";
import { PageHeader } from "~/components/page-header";
import { applianceToDraft } from "~/lib/load-sheet-drafts";
import { parseLoadSheetForm } from "~/lib/load-sheet-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { inverterChoices, requireTeamSite } from "~/server/load-sheet-route.server";
import { deleteLoadSheet, findLoadSheet, updateLoadSheet } from "~/server/load-sheets.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.sheet.name ?? "Load sheet"} · Kitwright` }];

async function loadSheet(request: Request, siteId: string, loadSheetId: string) {
  const context = await requireTeamSite(request, siteId);
  const sheet = await findLoadSheet(context.team.teamId, loadSheetId);
  if (!sheet || sheet.site_id !== context.site.id) throw new Response("No such load sheet at this site.", { status: 404 });
  return { ...context, sheet };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { site, sheet } = await loadSheet(request, params.siteId, params.loadSheetId);
  return {
    site: { id: site.id, name: site.name },
    sheet: { id: sheet.id, name: sheet.name, appliances: sheet.appliances },
    inverters: await inverterChoices(),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { team, site, sheet } = await loadSheet(request, params.siteId, params.loadSheetId);
  const formData = await request.formData();
  if (formData.get("intent") === "delete") {
    await deleteLoadSheet(team.teamId, sheet.id);
    return redirectWithFlash(`/sites/${site.id}`, { kind: "info", message: `Load sheet "${sheet.name}" deleted.` });
  }
  const parsed = parseLoadSheetForm(formData);
  if (!parsed.success) return data({ errors: parsed.fields }, { status: 400 });
  await updateLoadSheet(team.teamId, sheet.id, parsed.data);
  return redirectWithFlash(`/sites/${site.id}/loads/${sheet.id}`, { kind: "success", message: "Load sheet saved." });
}

export default function LoadSheetPage({ loaderData, actionData }: Route.ComponentProps) {
  const { site, sheet } = loaderData;
  return (
    <>
      <PageHeader
        title={sheet.name}
        lead={
          <>
            Load sheet for{" "}
            <Link to={`/sites/${site.id}`} className="underline">
              {site.name}
            </Link>
          </>
        }
        actions={
          <Form method="post" onSubmit={(e) => (confirm("Delete this load sheet?") ? undefined : e.preventDefault())}>
            <input type="hidden" name="intent" value="delete" />
            <button type="submit" className="rounded-md border border-fail px-3 py-2 text-sm text-fail">
              Delete load sheet
            </button>
          </Form>
        }
      />
      <LoadSheetEditor
        key={sheet.id}
        initialName={sheet.name}
        initialRows={sheet.appliances.map(applianceToDraft)}
        inverters={loaderData.inverters}
        errors={actionData?.errors ?? {}}
        submitLabel="Save changes"
      />
    </>
  );
}
