// Import a supplier's price list: first a check that lists every row's problems and writes nothing,
// then an import that writes every row in one transaction, or none.
import { data, Form, useNavigation } from "react-router";
import { CsvColumnsList, CsvSourceFields, CsvTemplateLink } from "~/components/csv-columns";
import type { Route } from "./+types/sourcing.import";
import { FormErrors, SubmitButton } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { OfferImportReportPanel } from "~/components/sourcing/offer-import-report";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { MAX_OFFER_CSV_BYTES, OFFER_CSV_COLUMNS } from "~/lib/sourcing-csv";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { checkOfferImport, importOffers } from "~/server/sourcing/offer-import.server";
import type { OfferImportReport } from "~/lib/sourcing-types";

export const meta: Route.MetaFunction = () => [{ title: "Import offers · Sourcing · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  await requireTeamMember(request);
  return null;
}

type Answer = { error: string; report: null; csvText: string } | { error: null; report: OfferImportReport; csvText: string };

function failure(error: string, status = 400) {
  return data<Answer>({ error, report: null, csvText: "" }, { status });
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  if (Number(request.headers.get("Content-Length") ?? 0) > MAX_OFFER_CSV_BYTES + 64 * 1024)
    return failure(`The file is larger than ${MAX_OFFER_CSV_BYTES / 1024 / 1024} MiB; split it.`, 413);
  const form = await request.formData();
  const intent = form.get("intent");
  if (intent !== "check" && intent !== "import") return failure("Unknown step: choose Check or Import.");
  const file = form.get("file");
  const pasted = form.get("csvText");
  const text = file instanceof File && file.size > 0 ? await file.text() : typeof pasted === "string" ? pasted : "";
  if (!text.trim()) return failure("Choose a CSV file or paste its contents.");
  if (intent === "check") return data<Answer>({ error: null, report: await checkOfferImport(db, team.teamId, text), csvText: text });
  const outcome = await importOffers(db, team.teamId, user.id, text);
  if (!outcome.ok) return data<Answer>({ error: null, report: outcome.report, csvText: text }, { status: 400 });
  const { newOffers, updatedOffers, newSuppliers } = outcome.report;
  const parts = [`${newOffers} new offer${newOffers === 1 ? "" : "s"}`];
  if (updatedOffers) parts.push(`${updatedOffers} updated`);
  const kept = outcome.report.expiredKept.length;
  if (kept) parts.push(`${kept} expired offer${kept === 1 ? "" : "s"} left as ${kept === 1 ? "it was" : "they were"}`);
  if (newSuppliers.length) parts.push(`${newSuppliers.length} new supplier${newSuppliers.length === 1 ? "" : "s"}`);
  return redirectWithFlash("/sourcing", { kind: "success", message: `Imported from the CSV file: ${parts.join(", ")}.` });
}

function template() {
  return `${OFFER_CSV_COLUMNS.map((c) => c.header).join(",")}\r\n`;
}

export default function SourcingImport({ actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const busy = navigation.state === "submitting";
  return (
    <>
      <PageHeader
        title="Import offers from CSV"
        lead="Check the file first: every row's problems are listed and nothing is written. The import then writes all rows together, or none if any row has a problem."
      />
      <SourcingTabs />
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="space-y-6">
          <Panel title="1 · Check the file">
            <Form method="post" encType="multipart/form-data" className="space-y-4">
              <FormErrors errors={actionData?.error ? [actionData.error] : undefined} />
              <CsvSourceFields fileLabel="CSV file of offers" />
              <SubmitButton name="intent" value="check" pending={busy}>
                Check the file (writes nothing)
              </SubmitButton>
            </Form>
          </Panel>
          {actionData?.report ? <OfferImportReportPanel report={actionData.report} csvText={actionData.csvText} busy={busy} /> : null}
        </div>
        <Panel title="Columns">
          <p className="mb-2 text-sm text-ink-soft">
            The first row names the columns (any order). Parts are matched to the catalogue by kind, maker and model. A row for a supplier and part you already
            have replaces that offer's terms. A row whose valid-until day has passed is refused, unless it is an offer you already have with the same
            valid-until day (as your own export writes it): that offer is left as it is, so exporting and importing again changes nothing.{" "}
            <CsvTemplateLink csv={template()} fileName="kitwright-offers-template.csv" />, or export your offers from the overview and edit them.
          </p>
          <CsvColumnsList columns={OFFER_CSV_COLUMNS} />
        </Panel>
      </div>
    </>
  );
}
