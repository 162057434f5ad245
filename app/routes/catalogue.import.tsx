// A curator imports parts from a CSV file: first a check that lists every row's problems and writes
// nothing, then an import that writes every row in one transaction, or none.
import { data, Form, Link, useNavigation } from "react-router";
import { CsvColumnsList, CsvSourceFields, CsvTemplateLink } from "~/components/csv-columns";
import type { Route } from "./+types/catalogue.import";
import { ImportReportPanel } from "~/components/catalogue/import-report";
import { FormErrors, SubmitButton } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { isPartKind, PART_KIND_LABELS, PART_KINDS, type PartKind } from "~/domain/catalogue/part-kinds";
import { MAX_CSV_BYTES, type ImportReport } from "~/lib/catalogue-csv-check";
import { CSV_COLUMNS, csvTemplate } from "~/lib/catalogue-csv-columns";
import { dryRunImport, importCatalogueCsv } from "~/server/catalogue/csv-import.server";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireRole } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "Import parts · Catalogue · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "curator");
  const kindParam = new URL(request.url).searchParams.get("kind") ?? "modules";
  return { kind: (isPartKind(kindParam) ? kindParam : "modules") as PartKind };
}

type ActionAnswer = { error: string; report: null; csvText: string } | { error: null; report: ImportReport; csvText: string };

function failure(error: string, status = 400) {
  return data<ActionAnswer>({ error, report: null, csvText: "" }, { status });
}

export async function action({ request }: Route.ActionArgs) {
  await requireRole(request, "curator");
  // Multipart framing adds a little; anything far beyond the CSV limit is refused before parsing.
  if (Number(request.headers.get("Content-Length") ?? 0) > MAX_CSV_BYTES + 64 * 1024)
    return failure(`The file is larger than ${MAX_CSV_BYTES / 1024 / 1024} MiB; split it into smaller files.`, 413);
  const form = await request.formData();
  const kind = form.get("kind");
  const intent = form.get("intent");
  if (!isPartKind(kind)) return failure("Pick which kind of part the file holds.");
  if (intent !== "check" && intent !== "import") return failure("Unknown step: choose Check or Import.");
  const file = form.get("file");
  const pasted = form.get("csvText");
  const text = file instanceof File && file.size > 0 ? await file.text() : typeof pasted === "string" ? pasted : "";
  if (!text.trim()) return failure("Choose a CSV file or paste its contents.");
  if (intent === "check") return data<ActionAnswer>({ error: null, report: await dryRunImport(db, kind, text), csvText: text });
  const outcome = await importCatalogueCsv(db, kind, text);
  if (!outcome.ok) return data<ActionAnswer>({ error: null, report: outcome.report, csvText: text }, { status: 400 });
  const label = PART_KIND_LABELS[kind];
  return redirectWithFlash(`/catalogue?kind=${kind}`, {
    kind: "success",
    message: `Imported ${outcome.written} ${outcome.written === 1 ? label.singular : label.plural.toLowerCase()} from the CSV file.`,
  });
}

export default function CatalogueImport({ loaderData, actionData }: Route.ComponentProps) {
  const { kind } = loaderData;
  const navigation = useNavigation();
  const busy = navigation.state === "submitting";
  const columns = CSV_COLUMNS[kind];
  const report = actionData?.report?.kind === kind ? actionData.report : null;
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={`/catalogue?kind=${kind}`} className="text-ink-soft underline">
          ← Catalogue
        </Link>
      </p>
      <PageHeader
        title="Import parts from CSV"
        lead="Check the file first: every row's problems are listed and nothing is written. The import then writes all rows together, or none if any row has a problem."
      />
      <nav aria-label="Kind of part in the file" className="mb-4 flex flex-wrap gap-1 border-b border-rule">
        {PART_KINDS.map((k) => (
          <Link
            key={k}
            to={`?kind=${k}`}
            aria-current={k === kind ? "page" : undefined}
            className={`-mb-px border-b-2 px-3 py-2 text-sm font-medium ${k === kind ? "border-copper" : "border-transparent text-ink-soft"}`}
          >
            {PART_KIND_LABELS[k].plural}
          </Link>
        ))}
      </nav>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="space-y-6">
          <Panel title="1 · Check the file">
            <Form method="post" encType="multipart/form-data" className="space-y-4">
              <FormErrors errors={actionData?.error ? [actionData.error] : undefined} />
              <input type="hidden" name="kind" value={kind} />
              <CsvSourceFields fileLabel={`CSV file of ${PART_KIND_LABELS[kind].plural.toLowerCase()}`} />
              <SubmitButton name="intent" value="check" pending={busy}>
                Check the file (writes nothing)
              </SubmitButton>
            </Form>
          </Panel>
          {report ? <ImportReportPanel report={report} csvText={actionData?.csvText ?? ""} busy={busy} /> : null}
        </div>
        <Panel title="Columns">
          <p className="mb-2 text-sm text-ink-soft">
            The first row names the columns (any order). Numbers use a decimal point.{" "}
            <CsvTemplateLink csv={csvTemplate(kind)} fileName={`kitwright-${kind}-template.csv`} />
          </p>
          <CsvColumnsList columns={columns} />
        </Panel>
      </div>
    </>
  );
}
