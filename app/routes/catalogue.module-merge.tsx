// A curator merges a duplicate module model into the one that stays: the duplicate's readings move
// there, verified figures are recomputed, and the duplicate disappears from the lists.
import { getFormProps, getInputProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/catalogue.module-merge";
import { formatNumber, Num } from "~/components/catalogue/figures";
import { FieldError, FormErrors, inputClass, SubmitButton } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { mergeFormSchema } from "~/lib/catalogue-forms";
import { parsePartQuery } from "~/lib/catalogue-query";
import type { ModuleItem } from "~/lib/catalogue-types";
import { mergeModules } from "~/server/catalogue/merge-modules.server";
import { findModuleDetail } from "~/server/catalogue/module-detail.server";
import { listModulePage } from "~/server/catalogue/module-list.server";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireRole } from "~/server/guards.server";
import { isUuid } from "~/server/modules.server";

export const meta: Route.MetaFunction = () => [{ title: "Merge a duplicate · Catalogue · Kitwright" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "curator");
  const detail = await findModuleDetail(db, params.moduleId);
  if (!detail) throw new Response("No module with that id in the catalogue.", { status: 404 });
  const url = new URL(request.url);
  const q = url.searchParams.get("q") ?? detail.module.maker;
  const parsed = parsePartQuery("modules", new URLSearchParams({ q, limit: "21" }));
  const candidates = parsed.ok ? (await listModulePage(db, parsed.query)).items.filter((m) => m.id !== detail.module.id).slice(0, 20) : [];
  return { duplicate: detail.module, mergedInto: detail.mergedInto, q, candidates };
}

export async function action({ request, params }: Route.ActionArgs) {
  await requireRole(request, "curator");
  const submission = parseWithZod(await request.formData(), { schema: mergeFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const duplicateId = params.moduleId;
  if (!isUuid(duplicateId)) throw new Response("No module with that id in the catalogue.", { status: 404 });
  const { survivorId } = submission.value;
  const names = await db.selectFrom("pv_module").select(["id", "maker", "model"]).where("id", "in", [duplicateId, survivorId]).execute();
  if (!names.some((n) => n.id === duplicateId)) throw new Response("No module with that id in the catalogue.", { status: 404 });
  const outcome = await db.transaction().execute((trx) => mergeModules(trx, duplicateId, survivorId));
  if (!outcome.ok) {
    const reply =
      outcome.field === "survivorId"
        ? submission.reply({ fieldErrors: { survivorId: [outcome.message] } })
        : submission.reply({ formErrors: [outcome.message] });
    return data({ result: reply }, { status: 400 });
  }
  const name = (id: string) => names.find((n) => n.id === id);
  const moved = outcome.movedReadings;
  return redirectWithFlash(`/catalogue/modules/${survivorId}`, {
    kind: "success",
    message: `Merged ${name(duplicateId)?.maker} ${name(duplicateId)?.model} into this model: ${moved} reading${moved === 1 ? "" : "s"} moved, verified figures recomputed.`,
  });
}

function Summary({ m }: { m: ModuleItem }) {
  return (
    <span className="figures text-sm text-ink-soft">
      <Num value={m.pmaxW} unit="W" /> · Voc <Num value={m.vocV} unit="V" decimals={1} /> · Isc <Num value={m.iscA} unit="A" decimals={2} /> ·{" "}
      {formatNumber(m.lengthMm)} × {formatNumber(m.widthMm)} mm · {m.readingCount} reading{m.readingCount === 1 ? "" : "s"}
    </span>
  );
}

export default function CatalogueModuleMerge({ loaderData, actionData }: Route.ComponentProps) {
  const { duplicate, mergedInto, q, candidates } = loaderData;
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(mergeFormSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: mergeFormSchema }),
  });
  const { key: _key, ...confirmProps } = getInputProps(fields.confirm, { type: "checkbox", value: "yes" });
  const title = `${duplicate.maker} ${duplicate.model}`;
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={`/catalogue/modules/${duplicate.id}`} className="text-ink-soft underline">
          ← {title}
        </Link>
      </p>
      <PageHeader
        title={`Merge ${title}`}
        lead="When the same model was entered twice, merge the duplicate into the entry that stays. Its field readings move there and count toward its verified figures; the duplicate disappears from the lists and its page points to the one that stays."
      />
      {mergedInto ? (
        <p role="status" className="rounded-md border border-warn bg-warn-wash p-4 text-sm text-warn">
          This model was already merged into{" "}
          <Link className="underline" to={`/catalogue/modules/${mergedInto.id}`}>
            {mergedInto.maker} {mergedInto.model}
          </Link>
          .
        </p>
      ) : (
        <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
          <Panel title="The duplicate">
            <p className="font-medium">{title}</p>
            <Summary m={duplicate} />
          </Panel>
          <Panel title="The model that stays">
            <Form method="get" className="mb-4 flex gap-2">
              <input name="q" defaultValue={q} aria-label="Search maker or model" placeholder="Search maker or model" className={inputClass} />
              <button className="rounded-md border border-rule px-4">Search</button>
            </Form>
            <Form method="post" {...getFormProps(form)} className="space-y-4">
              <FormErrors errors={form.errors} />
              <fieldset>
                <legend className="sr-only">Model that stays</legend>
                {candidates.length === 0 ? <p className="text-sm text-ink-soft">No other model matches this search.</p> : null}
                <ul className="divide-y divide-rule">
                  {candidates.map((m) => (
                    <li key={m.id}>
                      <label className="flex cursor-pointer items-start gap-3 py-2">
                        <input
                          type="radio"
                          name={fields.survivorId.name}
                          value={m.id}
                          className="mt-1 accent-copper"
                          aria-describedby={fields.survivorId.errorId}
                        />
                        <span>
                          <span className="block font-medium">
                            {m.maker} {m.model}
                          </span>
                          <Summary m={m} />
                        </span>
                      </label>
                    </li>
                  ))}
                </ul>
                <FieldError id={fields.survivorId.errorId} errors={fields.survivorId.errors} />
              </fieldset>
              <div>
                <label className="flex items-start gap-2 text-sm">
                  <input {...confirmProps} className="mt-1 accent-copper" />
                  <span>
                    I checked that both entries are the same model. The duplicate's readings move to the model I picked; this cannot be undone from the app.
                  </span>
                </label>
                <FieldError id={fields.confirm.errorId} errors={fields.confirm.errors} />
              </div>
              <SubmitButton pending={navigation.state === "submitting"}>Merge into the picked model</SubmitButton>
            </Form>
          </Panel>
        </div>
      )}
    </>
  );
}
