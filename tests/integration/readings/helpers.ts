// Field-reading fixtures for integration tests: a fresh catalogue module, a synthetic sweep, a
// real PNG, and multipart submissions through the reading form's action as a browser sends them.
import { BASE, isDataWithInit, toResult, type RouteClient } from "../helpers/route-client";
import { demoModulePhoto } from "../../../scripts/lib/demo-photo";
import * as readingsNew from "~/routes/readings-new";
import { currentAtVoltageA, explicitIvModel } from "~/domain/solar/iv-model";
import { db } from "~/server/db.server";

export { demoModulePhoto };

export { createTestModule } from "../helpers/fixtures";

/** A sweep CSV drawn from the explicit I–V model; `scale` shrinks the current (a weaker module). */
export function sweepCsv({ points = 60, scale = 1, seconds = 0.8 }: { points?: number; scale?: number; seconds?: number } = {}) {
  const curve = explicitIvModel({ vocV: 21.4, iscA: 5.4 * scale, vmpV: 17.3, impA: 5.0 * scale });
  const rows = Array.from({ length: points }, (_, i) => {
    const v = (21.4 * i) / (points - 1);
    return `${v.toFixed(4)},${currentAtVoltageA(curve, v).toFixed(5)},${((seconds * i) / (points - 1)).toFixed(3)}`;
  });
  return ["voltage (V),current (A),time (s)", ...rows].join("\n");
}

/** The fields of a good reading on a clear June noon in the (invented) valley. */
export function readingFields(moduleId: string, overrides: Record<string, string> = {}): Record<string, string> {
  return {
    moduleId,
    kind: "sweep",
    takenAtLocal: "2026-06-14T13:10",
    utcOffsetH: "2",
    latitudeDeg: "46.4",
    longitudeDeg: "9.8",
    tiltDeg: "35",
    azimuthDeg: "180",
    airTempC: "21",
    moduleTempC: "43",
    irradianceSource: "pyranometer",
    irradianceWm2: "940",
    instrument: "Electronic load EL-200 (invented), thermopile pyranometer, contact thermometer",
    method: "Module on an open rack, sweep from short to open circuit in about a second.",
    ...overrides,
  };
}

export interface Upload {
  name: string;
  type: string;
  bytes: Uint8Array | string;
}

export function readingForm(fields: Record<string, string>, files: { sweepFile?: Upload; photo?: Upload | null } = {}) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const sweep = files.sweepFile ?? (fields.kind === "sweep" ? { name: "sweep.csv", type: "text/csv", bytes: sweepCsv() } : undefined);
  if (sweep) form.append("sweepFile", new File([sweep.bytes as BlobPart], sweep.name, { type: sweep.type }));
  const photo = files.photo === undefined ? { name: "module.png", type: "image/png", bytes: demoModulePhoto(1) } : files.photo;
  if (photo) form.append("photo", new File([photo.bytes as BlobPart], photo.name, { type: photo.type }));
  return form;
}

/** Calls a route handler with a raw request (multipart, JSON…), as the server would. */
export async function callRoute(handler: (args: any) => unknown, request: Request, params: Record<string, string> = {}) {
  try {
    return await toResult(await handler({ request, params, context: {}, url: new URL(request.url), pattern: "" }));
  } catch (thrown) {
    if (thrown instanceof Response || isDataWithInit(thrown)) return toResult(thrown);
    throw thrown;
  }
}

export function authedRequest(client: RouteClient | null, path: string, init: RequestInit = {}) {
  const headers = new Headers(init.headers);
  if (client) headers.set("Cookie", client.cookieHeader());
  headers.set("Origin", BASE);
  return new Request(new URL(path, BASE), { ...init, headers });
}

export async function submitReading(client: RouteClient, form: FormData) {
  return callRoute(readingsNew.action, authedRequest(client, "/readings/new", { method: "POST", body: form }));
}

/** Submits a good reading and returns its id. */
export async function submitGoodReading(
  client: RouteClient,
  moduleId: string,
  overrides: Record<string, string> = {},
  files: Parameters<typeof readingForm>[1] = {},
) {
  const result = await submitReading(client, readingForm(readingFields(moduleId, overrides), files));
  if (result.status !== 302) throw new Error(`submission failed (${result.status}): ${JSON.stringify(result.data)}`);
  return result.location!.split("/").pop()!;
}

export async function countStored(userId: string) {
  const [readings, files] = await Promise.all([
    db
      .selectFrom("field_reading")
      .select((eb) => eb.fn.countAll<number>().as("n"))
      .where("submitted_by", "=", userId)
      .executeTakeFirstOrThrow(),
    db
      .selectFrom("stored_file")
      .select((eb) => eb.fn.countAll<number>().as("n"))
      .where("uploaded_by", "=", userId)
      .executeTakeFirstOrThrow(),
  ]);
  return { readings: Number(readings.n), files: Number(files.n) };
}
