import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import type { Route } from "./+types/site";
import { PageHeader } from "~/components/page-header";
import { SiteFormView } from "~/components/sites/site-form";
import { siteFormSchema } from "~/lib/site-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { findSite, siteToForm, updateSite } from "~/server/sites.server";
import { deleteSiteUnlessQuoted, siteDependents } from "~/server/site-delete.server";
import { dependentsWords, quotedSiteRefusal } from "~/lib/site-dependents";
import { db } from "~/server/db.server";
import { listLoadSheets } from "~/server/load-sheets.server";
import { SiteLoadSheets } from "~/components/sites/site-load-sheets";
import { SkyAssumptionNote } from "~/components/sky-assumption-note";
import { skyAssumptionOfPreset } from "~/domain/solar/sky-assumption";

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
  const dependents = await siteDependents(db, team.teamId, site.id);
  return {
    site: { id: site.id, name: site.name },
    dependents,
    form: siteToForm(site),
    sheets: sheets.map((s) => ({ id: s.id, name: s.name, applianceCount: s.appliances.length })),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { team, site } = await loadSite(request, params.siteId);
  const formData = await request.formData();
  if (formData.get("intent") === "delete") {
    const outcome = await deleteSiteUnlessQuoted(team.teamId, site.id);
    if (outcome.ok) return redirectWithFlash("/sites", { kind: "info", message: `Site "${site.name}" deleted, with its ${dependentsWords(outcome.removed)}.` });
    if (outcome.reason === "not-found") throw new Response("No such site in your team.", { status: 404 });
    return redirectWithFlash(`/sites/${site.id}`, { kind: "error", message: quotedSiteRefusal(outcome.quoteNumbers) });
  }
  const submission = parseWithZod(formData, { schema: siteFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  await updateSite(team.teamId, site.id, submission.value);
  return redirectWithFlash(`/sites/${site.id}`, { kind: "success", message: "Site saved." });
}

export default function SitePage({ loaderData, actionData }: Route.ComponentProps) {
  const quoted = loaderData.dependents.quoteNumbers;
  const { form } = loaderData;
  const sky = skyAssumptionOfPreset(form.irradianceSource === "clearness-preset" ? form.clearnessPreset : null);
  return (
    <>
      <PageHeader
        title={loaderData.site.name}
        actions={
          quoted.length ? (
            <p className="max-w-xs text-right text-sm text-ink-soft" data-testid="site-delete-blocked">
              This site cannot be deleted: {quoted.length > 1 ? "quotes" : "quote"} {quoted.join(", ")} {quoted.length > 1 ? "were" : "was"} priced from its plans.
            </p>
          ) : (
            <Form
              method="post"
              onSubmit={(e) => (confirm(`Delete this site with its ${dependentsWords(loaderData.dependents)}?`) ? undefined : e.preventDefault())}
            >
              <input type="hidden" name="intent" value="delete" />
              <button type="submit" className="rounded-md border border-fail px-3 py-2 text-sm text-fail">
                Delete site
              </button>
            </Form>
          )
        }
      />
      <SkyAssumptionNote assumption={sky} className="mb-6" />
      <SiteLoadSheets siteId={loaderData.site.id} sheets={loaderData.sheets} />
      <SiteFormView key={loaderData.site.id} lastResult={actionData?.result} submitLabel="Save changes" defaultValue={loaderData.form} />
    </>
  );
}
