// /readings/new — an installer submits a field reading: the module, what was measured (one point or
// a load sweep), the conditions and an evidence photo. The engine's result and flags show live
// before sending; the server recomputes them from the same inputs.
import { getFormProps, getInputProps, getSelectProps, getTextareaProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/readings-new";
import { FieldError, FormErrors, inputClass, SubmitButton } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { IrradianceFields, TemperatureFields, TimePlaceFields } from "~/components/readings/reading-form/conditions-fields";
import { MeasuredFields } from "~/components/readings/reading-form/measured-fields";
import { PreviewPanel } from "~/components/readings/reading-form/preview-panel";
import { TextInputField } from "~/components/readings/reading-form/unit-field";
import { SafetyCaution } from "~/components/readings/safety-caution";
import { SWEEP_CSV_MAX_BYTES } from "~/domain/readings/sweep-csv";
import { PHOTO_MAX_BYTES } from "~/lib/image-type";
import { readingFormSchema } from "~/lib/reading-forms";
import { previewReading, previewSweep } from "~/lib/reading-preview";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { listReadableModules } from "~/server/readings/reading-queries.server";
import { submitReading } from "~/server/readings/submit-reading.server";
import { readLimitedFormData, UploadTooLargeError } from "~/server/readings/upload.server";
import { skipAfterPreview } from "~/lib/preview-revalidation";

export const shouldRevalidate = skipAfterPreview;

export const meta: Route.MetaFunction = () => [{ title: "Submit a field reading · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  await requireTeamMember(request);
  const modules = await listReadableModules();
  const wanted = new URL(request.url).searchParams.get("moduleId");
  return {
    modules: modules.map((m) => ({
      id: m.id,
      label: `${m.maker} ${m.model} — ${m.pmax_w} W ${m.cell_technology}`,
      pmaxW: m.pmax_w,
      gammaPmaxPctPerC: m.gamma_pmax_pct_per_c,
      noctC: m.noct_c,
    })),
    moduleId: modules.some((m) => m.id === wanted) ? wanted : null,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  let formData: FormData;
  try {
    formData = await readLimitedFormData(request);
  } catch (error) {
    const message =
      error instanceof UploadTooLargeError
        ? `${error.message} The photo may be at most 5 MB; nothing was saved.`
        : "The upload could not be read (it was cut off or is not a form). Nothing was saved; please try again.";
    return data({ result: { status: "error" as const, error: { photo: [message] } } }, { status: error instanceof UploadTooLargeError ? 413 : 400 });
  }
  const submission = parseWithZod(formData, { schema: readingFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const outcome = await submitReading(submission.value, { userId: user.id, teamId: team.teamId });
  if (!outcome.ok) return data({ result: submission.reply({ fieldErrors: outcome.fieldErrors }) }, { status: 400 });
  return redirectWithFlash(`/readings/${outcome.readingId}`, {
    kind: "success",
    message: "Reading sent to the curator. You will get an e-mail when it is decided.",
  });
}

function formValues(form: HTMLFormElement | null): Record<string, string> {
  if (!form) return {};
  const values: Record<string, string> = {};
  for (const [name, value] of new FormData(form)) if (typeof value === "string") values[name] = value;
  return values;
}

function localNow() {
  const now = new Date();
  return new Date(now.getTime() - now.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
}

export default function NewReading({ loaderData, actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const formRef = useRef<HTMLFormElement>(null);
  const [kind, setKind] = useState<"single" | "sweep">("sweep");
  const [irradianceSource, setIrradianceSource] = useState("pyranometer");
  const [csv, setCsv] = useState<string | null>(null);
  const [csvError, setCsvError] = useState<string | null>(null);
  const [values, setValues] = useState<Record<string, string>>({});
  const engineProblem = useRef<{ field: string; message: string } | null>(null);
  const [form, fields] = useForm({
    lastResult: navigation.state === "idle" ? actionData?.result : undefined,
    constraint: getZodConstraint(readingFormSchema),
    // The engine's verdict (an unreadable sweep, the sun below the horizon…) blocks sending too,
    // so the installer sees it at the field without a round trip.
    onValidate: ({ formData }) =>
      parseWithZod(formData, {
        schema: readingFormSchema.superRefine((_value, ctx) => {
          if (engineProblem.current) ctx.addIssue({ code: "custom", path: [engineProblem.current.field], message: engineProblem.current.message });
        }),
      }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    defaultValue: { moduleId: loaderData.moduleId ?? undefined },
  });
  const refresh = useCallback(() => setValues(formValues(formRef.current)), []);

  // The browser knows its clock and time zone; the server does not.
  useEffect(() => {
    const el = formRef.current;
    if (!el) return;
    const set = (name: string, value: string) => {
      const input = el.elements.namedItem(name) as HTMLInputElement | null;
      if (input && !input.value) input.value = value;
    };
    set(fields.takenAtLocal.name, localNow());
    set(fields.utcOffsetH.name, String(-new Date().getTimezoneOffset() / 60));
    // A sweep chosen before the page finished loading fired no change event that React saw.
    const chosen = (el.elements.namedItem(fields.sweepFile.name) as HTMLInputElement | null)?.files?.[0];
    if (chosen) onSweepFile(chosen);
    refresh();
    // Runs once on mount; onSweepFile only sets state.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [fields.takenAtLocal.name, fields.utcOffsetH.name, refresh]);
  useEffect(refresh, [kind, irradianceSource, refresh]);

  const module = loaderData.modules.find((m) => m.id === values.moduleId) ?? null;
  const sweep = useMemo(() => {
    if (kind !== "sweep") return { state: "none" } as const;
    return csvError ? ({ state: "error", message: csvError } as const) : previewSweep(csv, values.sweepDurationS);
  }, [kind, csv, csvError, values.sweepDurationS]);
  const preview = useMemo(() => previewReading({ ...values, kind }, kind === "sweep" ? csv : null, module), [values, kind, csv, module]);
  engineProblem.current =
    sweep.state === "error"
      ? { field: "sweepFile", message: sweep.message }
      : preview.state === "error"
        ? { field: preview.field, message: preview.message }
        : null;

  const onSweepFile = (file: File | null) => {
    setCsv(null);
    setCsvError(null);
    if (!file) return;
    if (file.size > SWEEP_CSV_MAX_BYTES) return setCsvError(`The CSV file is larger than ${SWEEP_CSV_MAX_BYTES / 1024} KB.`);
    file.text().then(setCsv, () => setCsvError("The file could not be read."));
  };
  const { key: photoKey, ...photoProps } = getInputProps(fields.photo, { type: "file" });
  const { key: selectKey, ...selectProps } = getSelectProps(fields.moduleId);
  const { key: methodKey, ...methodProps } = getTextareaProps(fields.method);

  return (
    <>
      <PageHeader
        title="Submit a field reading"
        lead="Measure a module's maximum power in the sun, tell us the conditions, and the engine normalises it to standard test conditions. A curator reviews it before it counts."
      />
      <Form
        method="post"
        encType="multipart/form-data"
        ref={formRef}
        {...getFormProps(form)}
        onInput={refresh}
        onChange={refresh}
        className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]"
      >
        <div className="space-y-6">
          <FormErrors errors={form.errors} />
          <Panel title="Module">
            <label htmlFor={fields.moduleId.id} className="mb-1 block text-sm font-medium">
              Model
            </label>
            <select key={selectKey} {...selectProps} className={inputClass}>
              <option value="">Choose the module…</option>
              {loaderData.modules.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.label}
                </option>
              ))}
            </select>
            <FieldError id={fields.moduleId.errorId} errors={fields.moduleId.errors} />
          </Panel>
          <Panel title="Measurement">
            <MeasuredFields fields={fields} kind={kind} onKind={setKind} onSweepFile={onSweepFile} sweep={sweep} />
          </Panel>
          <Panel title="Time, place and orientation">
            <TimePlaceFields fields={fields} />
          </Panel>
          <Panel title="Temperature and irradiance">
            <div className="space-y-5">
              <TemperatureFields fields={fields} />
              <IrradianceFields fields={fields} source={irradianceSource} onSource={setIrradianceSource} />
            </div>
          </Panel>
          <Panel title="Instruments, method and evidence">
            <div className="space-y-3">
              <TextInputField field={fields.instrument} label="Instruments" hint="e.g. electronic load model, pyranometer, thermometer." />
              <div>
                <label htmlFor={fields.method.id} className="mb-1 block text-sm font-medium">
                  Method
                </label>
                <textarea key={methodKey} {...methodProps} rows={3} className={inputClass} />
                <p className="mt-1 text-xs text-ink-faint">
                  How the module was mounted and connected, how the sweep ran, anything unusual (dust, wind, shade nearby).
                </p>
                <FieldError id={fields.method.errorId} errors={fields.method.errors} />
              </div>
              <div>
                <label htmlFor={fields.photo.id} className="mb-1 block text-sm font-medium">
                  Evidence photo
                </label>
                <input
                  key={photoKey}
                  {...photoProps}
                  accept="image/jpeg,image/png,image/webp"
                  className="block w-full text-sm file:mr-3 file:rounded-md file:border file:border-rule file:bg-paper-deep file:px-3 file:py-1.5"
                />
                <p className="mt-1 text-xs text-ink-faint">
                  The module with its label and the instruments in place. JPEG, PNG or WebP, up to {PHOTO_MAX_BYTES / (1024 * 1024)} MB. Only your team and the
                  curators can open it.
                </p>
                <FieldError id={fields.photo.errorId} errors={fields.photo.errors} />
              </div>
            </div>
          </Panel>
        </div>
        <div className="space-y-6 lg:sticky lg:top-4 lg:self-start">
          <Panel title="Result before sending">
            <PreviewPanel preview={preview} nameplatePmaxW={module?.pmaxW ?? null} />
          </Panel>
          <SafetyCaution />
          <div className="flex items-center gap-3">
            <SubmitButton pending={navigation.state === "submitting"}>Send to the curator</SubmitButton>
            <span className="text-xs text-ink-faint">The server checks everything again.</span>
          </div>
        </div>
      </Form>
    </>
  );
}
