// The action behind the new-part and edit-part pages: validate with the kind's schema (messages at
// the field, 400, nothing saved), then create or update, then post/redirect/get with a flash.
import { parseWithZod } from "@conform-to/zod/v4";
import { data } from "react-router";
import { db } from "../db.server";
import { redirectWithFlash } from "../flash.server";
import { createPart, updatePart } from "./part-save.server";
import { PART_KIND_LABELS, type PartKind } from "~/domain/catalogue/part-kinds";
import { PART_FORM_SCHEMAS, type PartForm } from "~/lib/catalogue-forms";

export async function submitPartForm(request: Request, kind: PartKind, partId?: string) {
  const submission = parseWithZod(await request.formData(), { schema: PART_FORM_SCHEMAS[kind] });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const value = submission.value as PartForm;
  const outcome = partId ? await updatePart(db, kind, partId, value) : await createPart(db, kind, value);
  if (!outcome.ok) {
    const fieldErrors = Object.fromEntries(Object.entries(outcome.fields).map(([k, m]) => [k, [m]]));
    return data({ result: submission.reply({ fieldErrors }) }, { status: 400 });
  }
  const to = kind === "modules" ? `/catalogue/modules/${outcome.id}` : `/catalogue?kind=${kind}&q=${encodeURIComponent(`${value.maker} ${value.model}`)}`;
  const verb = partId ? "Saved" : "Added";
  return redirectWithFlash(to, { kind: "success", message: `${verb} the ${PART_KIND_LABELS[kind].singular} ${value.maker} ${value.model}.` });
}
