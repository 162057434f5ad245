// A curator corrects a part's figures. Merged duplicates cannot be edited: their page points to
// the model that stayed.
import { Link, useNavigation } from "react-router";
import type { Route } from "./+types/catalogue.part-edit";
import { PartEditor } from "~/components/catalogue/forms/part-editor";
import { PageHeader, Panel } from "~/components/page-header";
import { isPartKind, PART_KIND_LABELS } from "~/domain/catalogue/part-kinds";
import { formDefaults } from "~/server/catalogue/part-rows.server";
import { submitPartForm } from "~/server/catalogue/part-form-action.server";
import { findPartItem } from "~/server/catalogue/part-save.server";
import { db } from "~/server/db.server";
import { requireRole } from "~/server/guards.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `Edit ${data.title} · Catalogue · Kitwright` : "Edit · Kitwright" }];

async function editablePart(params: { kind: string; partId: string }) {
  if (!isPartKind(params.kind)) throw new Response("No such part kind in the catalogue.", { status: 404 });
  const part = await findPartItem(db, params.kind, params.partId);
  if (!part) throw new Response("No such part in the catalogue.", { status: 404 });
  if (part.mergedInto) throw new Response("This model was merged into another one; edit that one instead.", { status: 409 });
  return { kind: params.kind, part };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "curator");
  const { kind, part } = await editablePart(params);
  return { kind, partId: part.id, title: `${part.maker} ${part.model}`, defaults: formDefaults(kind, part) };
}

export async function action({ request, params }: Route.ActionArgs) {
  await requireRole(request, "curator");
  const { kind, part } = await editablePart(params);
  return submitPartForm(request, kind, part.id);
}

export default function CataloguePartEdit({ loaderData, actionData }: Route.ComponentProps) {
  const { kind, partId, title, defaults } = loaderData;
  const navigation = useNavigation();
  const back = kind === "modules" ? `/catalogue/modules/${partId}` : `/catalogue?kind=${kind}`;
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={back} className="text-ink-soft underline">
          ← {kind === "modules" ? title : "Catalogue"}
        </Link>
      </p>
      <PageHeader
        title={`Edit ${title}`}
        lead={`Correct the ${PART_KIND_LABELS[kind].singular}'s datasheet figures. The catalogue is shared: every team sees the change.`}
      />
      <Panel>
        <PartEditor
          kind={kind}
          lastResult={actionData?.result}
          defaultValue={defaults}
          pending={navigation.state === "submitting"}
          submitLabel="Save changes"
        />
      </Panel>
    </>
  );
}
