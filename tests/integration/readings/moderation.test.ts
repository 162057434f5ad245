// Moderation: submit → pending → a curator approves → the module's verified figures change in the
// same transaction; rejecting leaves them; only curators decide; every decision is kept; the
// submitter is told by e-mail; the queue scores outliers against approved readings.
import { describe, expect, it } from "vitest";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { authedRequest, callRoute, createTestModule, submitGoodReading, sweepCsv } from "./helpers";
import * as readingPage from "~/routes/reading";
import * as review from "~/routes/review";
import { db } from "~/server/db.server";
import { listOutbox } from "~/server/outbox.server";

async function mailWithSubject(email: string, part: string) {
  for (let attempt = 0; attempt < 50; attempt++) {
    const found = (await listOutbox(email)).find((m) => m.subject.includes(part));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail "${part}" to ${email}`);
}

async function moduleRow(id: string) {
  return db
    .selectFrom("pv_module")
    .select(["verified_pmax_w", "verified_reading_count", "verified_ratio", "measured_density_wm2"])
    .where("id", "=", id)
    .executeTakeFirstOrThrow();
}

async function readingRow(id: string) {
  return db.selectFrom("field_reading").select(["status", "stc_pmax_w", "weight"]).where("id", "=", id).executeTakeFirstOrThrow();
}

describe("moderation", () => {
  it("approves a pending reading: the module's verified figures change, the decision is kept and the submitter is told", async () => {
    const installer = await installerWithTeam("mod-approve");
    const curator = await userWithRole("curator", "mod-curator");
    const module = await createTestModule("approve");
    const readingId = await submitGoodReading(installer.client, module.id);
    expect((await readingRow(readingId)).status).toBe("pending");
    expect((await moduleRow(module.id)).verified_pmax_w).toBeNull();

    const queue = await curator.client.loader(review, "/review");
    expect(queue.status).toBe(200);
    expect(queue.data.queue.map((r: { id: string }) => r.id)).toContain(readingId);

    const approve = await curator.client.action(review, "/review", {
      intent: "decide",
      readingId,
      decision: "approved",
      reason: "Clear sky, pyranometer in plane, photo shows the label.",
    });
    expect(approve.status, JSON.stringify(approve.data)).toBe(302);
    const reading = await readingRow(readingId);
    expect(reading.status).toBe("approved");
    const after = await moduleRow(module.id);
    expect(after.verified_pmax_w).toBeCloseTo(reading.stc_pmax_w, 9);
    expect(after.verified_reading_count).toBe(1);
    expect(after.verified_ratio).toBeCloseTo(reading.stc_pmax_w / 100, 9);
    expect(after.measured_density_wm2).toBeCloseTo(reading.stc_pmax_w / 0.67, 6);

    const detail = await installer.client.loader(readingPage, `/readings/${readingId}`, { readingId });
    expect(detail.data.reading.status).toBe("approved");
    expect(detail.data.decisions).toEqual([
      expect.objectContaining({ decision: "approved", reason: "Clear sky, pyranometer in plane, photo shows the label.", curatorName: "Test mod-curator" }),
    ]);

    const mail = await mailWithSubject(installer.email, "is approved");
    expect(mail.text).toContain("Reason: Clear sky, pyranometer in plane, photo shows the label.");
    expect(mail.text).toContain(`/readings/${readingId}`);
  });

  it("rejects with a reason: the verified figures stay as they were, and the submitter learns why", async () => {
    const installer = await installerWithTeam("mod-reject");
    const curator = await userWithRole("curator", "mod-curator-2");
    const module = await createTestModule("reject");
    const first = await submitGoodReading(installer.client, module.id);
    await curator.client.action(review, "/review", { intent: "decide", readingId: first, decision: "approved", reason: "" });
    const before = await moduleRow(module.id);
    expect(before.verified_reading_count).toBe(1);

    const second = await submitGoodReading(
      installer.client,
      module.id,
      {},
      { sweepFile: { name: "weak.csv", type: "text/csv", bytes: sweepCsv({ scale: 0.6 }) } },
    );
    const noReason = await curator.client.action(review, "/review", { intent: "decide", readingId: second, decision: "rejected", reason: "" });
    expect(noReason.status).toBe(400);
    expect(noReason.data.result.error.reason[0]).toMatch(/reason/);
    expect((await readingRow(second)).status).toBe("pending");

    const reject = await curator.client.action(review, "/review", {
      intent: "decide",
      readingId: second,
      decision: "rejected",
      reason: "Partial shade from the railing is visible in the photo.",
    });
    expect(reject.status).toBe(302);
    expect((await readingRow(second)).status).toBe("rejected");
    const after = await moduleRow(module.id);
    expect(after.verified_pmax_w).toBe(before.verified_pmax_w);
    expect(after.verified_reading_count).toBe(1);
    const mail = await mailWithSubject(installer.email, "was not accepted");
    expect(mail.text).toContain("Reason: Partial shade from the railing is visible in the photo.");

    // The first approval was given the standard reason, and it is on record.
    const decisions = await db.selectFrom("reading_decision").select(["decision", "reason", "decided_by"]).where("reading_id", "=", first).execute();
    expect(decisions).toEqual([{ decision: "approved", reason: "Approved: the conditions and evidence are in order.", decided_by: curator.userId }]);
  });

  it("refuses decisions from anyone but a curator (403) and leaves the reading pending", async () => {
    const installer = await installerWithTeam("mod-403");
    const admin = await userWithRole("admin", "mod-admin");
    const module = await createTestModule("forbidden");
    const readingId = await submitGoodReading(installer.client, module.id);
    const form = { intent: "decide", readingId, decision: "approved", reason: "I like it." };
    expect((await installer.client.action(review, "/review", form)).status).toBe(403);
    expect((await installer.client.action(readingPage, `/readings/${readingId}`, form, { readingId })).status).toBe(403);
    expect((await admin.client.action(review, "/review", form)).status).toBe(403);
    expect((await installer.client.loader(review, "/review")).status).toBe(403);
    expect((await readingRow(readingId)).status).toBe("pending");
    expect(await db.selectFrom("reading_decision").select("id").where("reading_id", "=", readingId).execute()).toEqual([]);
  });

  it("keeps every decision when a curator later revokes an approval, and recomputes the figures", async () => {
    const installer = await installerWithTeam("mod-revoke");
    const curator = await userWithRole("curator", "mod-curator-3");
    const module = await createTestModule("revoke");
    const readingId = await submitGoodReading(installer.client, module.id);
    await curator.client.action(
      readingPage,
      `/readings/${readingId}`,
      { intent: "decide", readingId, decision: "approved", reason: "Looks right." },
      { readingId },
    );
    expect((await moduleRow(module.id)).verified_reading_count).toBe(1);
    // From the queue a decided reading is left alone (another curator was quicker).
    const stale = await curator.client.action(review, "/review", { intent: "decide", readingId, decision: "rejected", reason: "Second thoughts." });
    expect(stale.status).toBe(409);
    const revoke = await curator.client.action(
      readingPage,
      `/readings/${readingId}`,
      { intent: "decide", readingId, decision: "rejected", reason: "The pyranometer was found out of calibration." },
      { readingId },
    );
    expect(revoke.status).toBe(302);
    const after = await moduleRow(module.id);
    expect(after.verified_pmax_w).toBeNull();
    expect(after.verified_reading_count).toBe(0);
    const detail = await curator.client.loader(readingPage, `/readings/${readingId}`, { readingId });
    expect(detail.data.decisions.map((d: { decision: string; reason: string }) => [d.decision, d.reason])).toEqual([
      ["approved", "Looks right."],
      ["rejected", "The pyranometer was found out of calibration."],
    ]);
  });

  it("bulk-approves several readings in one transaction; the verified power is their weighted median", async () => {
    const installer = await installerWithTeam("mod-bulk");
    const curator = await userWithRole("curator", "mod-curator-4");
    const module = await createTestModule("bulk");
    const measured = await submitGoodReading(installer.client, module.id);
    const weaker = await submitGoodReading(
      installer.client,
      module.id,
      {},
      { sweepFile: { name: "w.csv", type: "text/csv", bytes: sweepCsv({ scale: 0.9 }) } },
    );
    const estimated = await submitGoodReading(
      installer.client,
      module.id,
      { irradianceSource: "clear-sky-estimate", irradianceWm2: "" },
      { sweepFile: { name: "e.csv", type: "text/csv", bytes: sweepCsv({ scale: 0.8 }) } },
    );
    expect((await readingRow(estimated)).weight).toBe(0.5);

    const bulk = new FormData();
    bulk.append("intent", "bulk");
    for (const id of [measured, weaker, estimated]) bulk.append("readingIds", id);
    bulk.append("decision", "approved");
    bulk.append("reason", "Consistent with each other.");
    const empty = await curator.client.action(review, "/review", { intent: "bulk", decision: "approved", reason: "" });
    expect(empty.status).toBe(400);
    expect(empty.data.result.error.readingIds[0]).toMatch(/Tick at least one/);
    const response = await callRoute(review.action, authedRequest(curator.client, "/review", { method: "POST", body: bulk }));
    expect(response.status).toBe(302);

    const rows = await Promise.all([measured, weaker, estimated].map(readingRow));
    expect(rows.map((r) => r.status)).toEqual(["approved", "approved", "approved"]);
    // Weights 1, 1, 0.5: sorted by value, the cumulative weight first passes half of 2.5 at the middle value.
    const sorted = [...rows].sort((a, b) => a.stc_pmax_w - b.stc_pmax_w);
    let cumulative = 0;
    const expected = sorted.find((r) => (cumulative += r.weight) > 1.25)!.stc_pmax_w;
    const after = await moduleRow(module.id);
    expect(after.verified_pmax_w).toBeCloseTo(expected, 9);
    expect(after.verified_reading_count).toBe(3);
    for (const id of [measured, weaker, estimated])
      expect(await db.selectFrom("reading_decision").select("reason").where("reading_id", "=", id).execute()).toEqual([
        { reason: "Consistent with each other." },
      ]);
  });

  it("lists the queue oldest first and marks an outlier against three approved readings", async () => {
    const installer = await installerWithTeam("mod-queue");
    const curator = await userWithRole("curator", "mod-curator-5");
    const module = await createTestModule("queue");
    const approved = [];
    for (const scale of [0.98, 1.0, 1.02])
      approved.push(await submitGoodReading(installer.client, module.id, {}, { sweepFile: { name: "a.csv", type: "text/csv", bytes: sweepCsv({ scale }) } }));
    for (const id of approved) await curator.client.action(review, "/review", { intent: "decide", readingId: id, decision: "approved", reason: "" });
    const typical = await submitGoodReading(
      installer.client,
      module.id,
      {},
      { sweepFile: { name: "t.csv", type: "text/csv", bytes: sweepCsv({ scale: 1.01 }) } },
    );
    const outlier = await submitGoodReading(
      installer.client,
      module.id,
      {},
      { sweepFile: { name: "o.csv", type: "text/csv", bytes: sweepCsv({ scale: 0.7 }) } },
    );

    const mine = async () => {
      const pages = [];
      for (let page = 1; ; page++) {
        const result = await curator.client.loader(review, `/review?page=${page}`);
        pages.push(...result.data.queue);
        if (page >= result.data.pages) break;
      }
      return pages.filter((r: { id: string }) => r.id === typical || r.id === outlier);
    };
    const queue = await mine();
    expect(queue.map((r: { id: string }) => r.id)).toEqual([typical, outlier]);
    const [t, o] = queue;
    expect(t.outlier.approvedCount).toBe(3);
    expect(Math.abs(t.outlier.z)).toBeLessThan(3.5);
    expect(t.outlier.isOutlier).toBe(false);
    expect(o.outlier.z).toBeLessThan(-3.5);
    expect(o.outlier.isOutlier).toBe(true);
    expect(o.sweep.length).toBe(60);
    expect(o.photoId).toMatch(/^[0-9a-f-]{36}$/);
  });
});
