// A curator adds a part of one kind to the shared catalogue.
import { Link, useNavigation } from "react-router";
import type { Route } from "./+types/catalogue.part-new";
import { PartEditor } from "~/components/catalogue/forms/part-editor";
import { PageHeader, Panel } from "~/components/page-header";
import { isPartKind, PART_KIND_LABELS } from "~/domain/catalogue/part-kinds";
import { submitPartForm } from "~/server/catalogue/part-form-action.server";
import { requireRole } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "New part · Catalogue · Kitwright" }];

function kindOf(params: { kind: string }) {
  if (!isPartKind(params.kind)) throw new Response("No such part kind in the catalogue.", { status: 404 });
  return params.kind;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "curator");
  return { kind: kindOf(params) };
}

export async function action({ request, params }: Route.ActionArgs) {
  await requireRole(request, "curator");
  return submitPartForm(request, kindOf(params));
}

export default function CataloguePartNew({ loaderData, actionData }: Route.ComponentProps) {
  const { kind } = loaderData;
  const navigation = useNavigation();
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={`/catalogue?kind=${kind}`} className="text-ink-soft underline">
          ← Catalogue
        </Link>
      </p>
      <PageHeader
        title={`New ${PART_KIND_LABELS[kind].singular}`}
        lead="Enter the figures as the maker's datasheet gives them. Each is checked against the others before it is saved."
      />
      <Panel>
        <PartEditor
          kind={kind}
          lastResult={actionData?.result}
          defaultValue={kind === "modules" ? { nominalTempKind: "noct" } : {}}
          pending={navigation.state === "submitting"}
          submitLabel="Add to the catalogue"
        />
      </Panel>
    </>
  );
}
