import { parseWithZod } from "@conform-to/zod/v4";
import { data } from "react-router";
import type { Route } from "./+types/sites-new";
import { PageHeader } from "~/components/page-header";
import { SiteFormView } from "~/components/sites/site-form";
import { siteFormSchema } from "~/lib/site-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { createSite } from "~/server/sites.server";

export const meta: Route.MetaFunction = () => [{ title: "New site · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  await requireTeamMember(request);
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const submission = parseWithZod(await request.formData(), { schema: siteFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const id = await createSite(team.teamId, user.id, submission.value);
  return redirectWithFlash(`/sites/${id}`, { kind: "success", message: `Site "${submission.value.name}" saved.` });
}

const BLANK_MONTHS = Array.from({ length: 12 }, () => ({ tMaxC: undefined as unknown as number, tMinC: undefined as unknown as number }));

export default function SitesNew({ actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="New site" lead="Where the kit will stand, which way the array faces, and the climate month by month." />
      <SiteFormView
        lastResult={actionData?.result}
        submitLabel="Save site"
        azimuthFollowsLatitude
        defaultValue={{ irradianceSource: "measured", albedo: 0.2, shadingDeratePct: 0, elevationM: 0, azimuthDeg: 180, months: BLANK_MONTHS }}
      />
    </>
  );
}
