// POST /api/v1/offers/import?dryRun=true|false — import offers from CSV (the same columns as the
// page; body: the CSV as text/csv, or JSON { "csv": "…" }). dryRun defaults to true: the report of
// every row's problems and nothing written. With dryRun=false every row is written in one
// transaction, or none: a file with problems answers 400 with the report.
import type { Route } from "./+types/api.v1.offers.import";
import { MAX_OFFER_CSV_BYTES } from "~/lib/sourcing-csv";
import type { OfferImportReport } from "~/lib/sourcing-types";
import { db } from "~/server/db.server";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { checkOfferImport, importOffers } from "~/server/sourcing/offer-import.server";

async function readCsv(request: Request): Promise<string | Response> {
  const type = request.headers.get("Content-Type") ?? "";
  if (Number(request.headers.get("Content-Length") ?? 0) > MAX_OFFER_CSV_BYTES + 1024)
    return jsonError(413, `The body is larger than ${MAX_OFFER_CSV_BYTES / 1024 / 1024} MiB; split the file.`);
  const text = await request.text();
  if (text.length > MAX_OFFER_CSV_BYTES + 1024) return jsonError(413, `The body is larger than ${MAX_OFFER_CSV_BYTES / 1024 / 1024} MiB; split the file.`);
  if (type.includes("text/csv") || type.includes("text/plain")) return text;
  if (type.includes("application/json")) {
    try {
      const body = JSON.parse(text) as { csv?: unknown };
      if (typeof body?.csv === "string") return body.csv;
    } catch {
      return jsonError(400, "The body is not valid JSON.");
    }
    return jsonError(400, 'Send { "csv": "…" } with the file\'s text.', { csv: "Required: the CSV text." });
  }
  return jsonError(415, 'Send the CSV as text/csv, or JSON { "csv": "…" }.');
}

function problemFields(report: OfferImportReport) {
  const fields: Record<string, string> = {};
  report.fileErrors.forEach((e, i) => (fields[`file.${i}`] = e));
  for (const p of report.problems) for (const e of p.errors) fields[`rows.${p.row}.${e.column}`] ??= e.message;
  return fields;
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use POST with the CSV as the body.");
  const { teamId, userId } = await requireApiTeam(request);
  const dryRunText = new URL(request.url).searchParams.get("dryRun") ?? "true";
  if (dryRunText !== "true" && dryRunText !== "false")
    return jsonError(400, "The query needs corrections.", { dryRun: "Use true (check only) or false (write)." });
  const csv = await readCsv(request);
  if (csv instanceof Response) return csv;
  if (dryRunText === "true") {
    const report = await checkOfferImport(db, teamId, csv);
    return Response.json({ dryRun: true, written: false, report });
  }
  const outcome = await importOffers(db, teamId, userId, csv);
  if (!outcome.ok) {
    return Response.json(
      { error: { message: "Nothing was written: the file has problems (listed by row).", fields: problemFields(outcome.report) }, report: outcome.report },
      { status: 400 },
    );
  }
  return Response.json({ dryRun: false, written: true, report: outcome.report }, { status: 201 });
}

export async function loader() {
  return jsonError(405, "Use POST with the CSV as the body.");
}
