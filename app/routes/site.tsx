import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import type { Route } from "./+types/site";
import { PageHeader } from "~/components/page-header";
import { SiteFormView } from "~/components/sites/site-form";
import { siteFormSchema } from "~/lib/site-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { deleteSite, findSite, siteToForm, updateSite } from "~/server/sites.server";
import { listLoadSheets } from "~/server/load-sheets.server";
import { SiteLoadSheets } from "~/components/sites/site-load-sheets";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.site.name ?? "Site"} · Kitwright` }];

async function loadSite(request: Request, siteId: string) {
  const { user, team } = await requireTeamMember(request);
  const site = await findSite(team.teamId, siteId);
  // Another team's site and a made-up id look the same: not found.
  if (!site) throw new Response("No such site in your team.", { status: 404 });
  return { user, team, site };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team, site } = await loadSite(request, params.siteId);
  const sheets = await listLoadSheets(team.teamId, site.id);
  return {
    site: { id: site.id, name: site.name },
    form: siteToForm(site),
    sheets: sheets.map((s) => ({ id: s.id, name: s.name, applianceCount: s.appliances.length })),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { team, site } = await loadSite(request, params.siteId);
  const formData = await request.formData();
  if (formData.get("intent") === "delete") {
    await deleteSite(team.teamId, site.id);
    return redirectWithFlash("/sites", { kind: "info", message: `Site "${site.name}" deleted, with its load sheets.` });
  }
  const submission = parseWithZod(formData, { schema: siteFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  await updateSite(team.teamId, site.id, submission.value);
  return redirectWithFlash(`/sites/${site.id}`, { kind: "success", message: "Site saved." });
}

export default function SitePage({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader
        title={loaderData.site.name}
        actions={
          <Form method="post" onSubmit={(e) => (confirm("Delete this site and its load sheets?") ? undefined : e.preventDefault())}>
            <input type="hidden" name="intent" value="delete" />
            <button type="submit" className="rounded-md border border-fail px-3 py-2 text-sm text-fail">
              Delete site
            </button>
          </Form>
        }
      />
      <SiteLoadSheets siteId={loaderData.site.id} sheets={loaderData.sheets} />
      <SiteFormView key={loaderData.site.id} lastResult={actionData?.result} submitLabel="Save changes" defaultValue={loaderData.form} />
    </>
  );
}
