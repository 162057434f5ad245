import { data, Form, Link } from "react-router";
import type { Route } from "./+types/plans-new";
import { PageHeader, Panel } from "~/components/page-header";
import { PlanEditor } from "~/components/plan-editor/plan-editor";
import { PlanResultView } from "~/components/plan-editor/plan-result-view";
import { editorStateFrom } from "~/lib/plan-editor-state";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { defaultChoices, editorOptions } from "~/server/plans/plan-page.server";
import { choicesFromForm, planFromChoices } from "~/server/plans/plan-service.server";
import { createPlan } from "~/server/plans/plans.server";
import { findSite, listSites } from "~/server/sites.server";
import { skipAfterPreview } from "~/lib/preview-revalidation";

export const shouldRevalidate = skipAfterPreview;

export const meta: Route.MetaFunction = () => [{ title: "New kit plan · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const sites = await listSites(team.teamId);
  const wanted = new URL(request.url).searchParams.get("siteId");
  const site = wanted ? await findSite(team.teamId, wanted) : sites[0] ? await findSite(team.teamId, sites[0].id) : undefined;
  if (wanted && !site) throw new Response("No such site in your team.", { status: 404 });
  const siteList = sites.map((s) => ({ id: s.id, label: s.name }));
  if (!site) return { sites: siteList, siteId: null, options: null, initial: null, initialPlan: null };
  const options = await editorOptions(team.teamId, site.id);
  const choices = await defaultChoices(site.id, site.name, options.loadSheets[0]?.id ?? "");
  const first = await planFromChoices(team.teamId, choices);
  return {
    sites: siteList,
    siteId: site.id,
    options,
    initial: editorStateFrom(choices),
    initialPlan: first.ok ? { plan: first.plan, sources: first.sources, parts: first.input.parts } : null,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const outcome = await planFromChoices(team.teamId, choicesFromForm(await request.formData()));
  if (!outcome.ok) return data({ errors: outcome.fields, message: outcome.message }, { status: 400 });
  const id = await createPlan(team.teamId, user.id, outcome.choices, outcome.input, outcome.plan);
  return redirectWithFlash(`/plans/${id}`, { kind: "success", message: `Plan "${outcome.choices.name}" saved as revision 1.` });
}

export default function PlansNew({ loaderData, actionData }: Route.ComponentProps) {
  const { sites, siteId, options, initial, initialPlan } = loaderData;
  return (
    <>
      <PageHeader title="New kit plan" lead="Choose the parts and the design; the plan follows every change. Save it when it is right." />
      {sites.length === 0 ? (
        <Panel>
          <p>
            A plan needs a site first.{" "}
            <Link to="/sites/new" className="font-medium text-copper underline">
              Create a site
            </Link>
            , then a load sheet for it.
          </p>
        </Panel>
      ) : (
        <Form method="get" className="mb-4 flex max-w-lg items-end gap-2">
          <div className="flex-1">
            <label htmlFor="site" className="mb-0.5 block text-sm font-medium">
              Site
            </label>
            <select id="site" name="siteId" defaultValue={siteId ?? ""} className="block w-full rounded-md border border-rule bg-sheet px-2 py-1.5">
              {sites.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label}
                </option>
              ))}
            </select>
          </div>
          <button className="rounded-md border border-rule px-3 py-1.5">Use this site</button>
        </Form>
      )}
      {options && initial && options.loadSheets.length === 0 ? (
        <Panel>
          <p>
            This site has no load sheet yet.{" "}
            <Link to={`/sites/${siteId}/loads/new`} className="font-medium text-copper underline">
              Add one
            </Link>{" "}
            to plan a kit.
          </p>
        </Panel>
      ) : null}
      {options && initial && options.loadSheets.length > 0 ? (
        <PlanEditor
          key={siteId}
          initial={initial}
          initialPlan={initialPlan}
          options={options}
          serverErrors={actionData?.errors ?? {}}
          saveLabel="Save plan"
          renderPlan={(shown) => <PlanResultView plan={shown.plan} sources={shown.sources} parts={shown.parts} overrides={[]} />}
        />
      ) : null}
    </>
  );
}
