// JSON API for readings: the preview computes without storing; the list is per team.
import { describe, expect, it } from "vitest";
import { RouteClient } from "../helpers/route-client";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { authedRequest, callRoute, createTestModule, readingFields, submitGoodReading, sweepCsv } from "./helpers";
import * as preview from "~/routes/api.v1.readings.preview";
import * as readingsApi from "~/routes/api.v1.readings";
import { db } from "~/server/db.server";

function jsonPost(client: RouteClient | null, body: unknown) {
  return callRoute(
    preview.action,
    authedRequest(client, "/api/v1/readings/preview", { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(body) }),
  );
}

function previewBody(moduleId: string, overrides: Record<string, unknown> = {}) {
  const fields = readingFields(moduleId);
  const numbers = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, /^-?\d+(\.\d+)?$/.test(v) ? Number(v) : v]));
  return { ...numbers, sweepCsv: sweepCsv(), ...overrides };
}

describe("readings API", () => {
  it("previews a reading without storing it", async () => {
    const installer = await installerWithTeam("api-preview");
    const module = await createTestModule("preview");
    const result = await jsonPost(installer.client, previewBody(module.id));
    expect(result.status, JSON.stringify(result.data)).toBe(200);
    expect(result.data.sweep.pointCount).toBe(60);
    expect(result.data.stcPmaxW).toBeCloseTo((result.data.measuredPmaxW * (1000 / 940)) / (1 - 0.004 * (result.data.cellTempC - 25)), 9);
    expect(result.data.takenAt).toBe("2026-06-14T11:10:00.000Z");
    expect(result.data.flags).toEqual([]);
    const stored = await db.selectFrom("field_reading").select("id").where("module_id", "=", module.id).execute();
    expect(stored).toEqual([]);
  });

  it("answers 401 to anonymous callers and 400 with field paths to bad bodies", async () => {
    const installer = await installerWithTeam("api-bad");
    const module = await createTestModule("api-bad");
    expect((await jsonPost(null, previewBody(module.id))).status).toBe(401);
    const bad = await jsonPost(installer.client, previewBody(module.id, { tiltDeg: 200, irradianceWm2: undefined }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.data.error.fields)).toContain("tiltDeg");
    const points = await jsonPost(installer.client, previewBody(module.id, { sweepCsv: undefined, sweep: [{ voltageV: 1, currentA: 5 }] }));
    expect(points.status).toBe(400);
    expect(points.data.error.fields.sweep).toMatch(/at least 10/);
  });

  it("lists a team's readings, filtered by status; curators see all", async () => {
    const installer = await installerWithTeam("api-list");
    const curator = await userWithRole("curator", "api-curator");
    const module = await createTestModule("list");
    const id = await submitGoodReading(installer.client, module.id);
    const pending = await callRoute(readingsApi.loader, authedRequest(installer.client, "/api/v1/readings?status=pending"));
    expect(pending.data).toMatchObject({ total: 1, items: [{ id, status: "pending", module: { id: module.id } }] });
    const approved = await callRoute(readingsApi.loader, authedRequest(installer.client, "/api/v1/readings?status=approved"));
    expect(approved.data.total).toBe(0);
    expect((await callRoute(readingsApi.loader, authedRequest(installer.client, "/api/v1/readings?status=maybe"))).status).toBe(400);
    const all = await callRoute(readingsApi.loader, authedRequest(curator.client, "/api/v1/readings?status=pending&limit=200"));
    expect(all.data.total).toBeGreaterThanOrEqual(1);
  });
});
