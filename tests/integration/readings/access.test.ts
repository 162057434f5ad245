// Who sees what: a reading and its photo are visible to the submitting team and curators only;
// anonymous visitors never get a photo; the photo is served with its checked type, never sniffed.
import { describe, expect, it } from "vitest";
import { RouteClient } from "../helpers/route-client";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { authedRequest, callRoute, createTestModule, submitGoodReading } from "./helpers";
import * as file from "~/routes/files.$fileId";
import * as readingPage from "~/routes/reading";
import * as readings from "~/routes/readings";
import * as readingsApi from "~/routes/api.v1.readings";
import { db } from "~/server/db.server";

async function fetchPhoto(client: RouteClient | null, fileId: string) {
  const request = authedRequest(client, `/files/${fileId}`);
  try {
    return (await file.loader({ request, params: { fileId }, context: {} } as never)) as Response;
  } catch (thrown) {
    if (thrown instanceof Response) return thrown;
    throw thrown;
  }
}

describe("reading and photo access", () => {
  it("shows a reading and its photo to the team and curators, and to nobody else", async () => {
    const owner = await installerWithTeam("access-owner");
    const other = await installerWithTeam("access-other");
    const curator = await userWithRole("curator", "access-curator");
    const customer = await userWithRole("customer", "access-customer");
    const module = await createTestModule("access");
    const readingId = await submitGoodReading(owner.client, module.id);
    const { photo_id: photoId } = await db.selectFrom("field_reading").select("photo_id").where("id", "=", readingId).executeTakeFirstOrThrow();

    const mine = await owner.client.loader(readingPage, `/readings/${readingId}`, { readingId });
    expect(mine.status).toBe(200);
    expect(mine.data.reading.photoId).toBe(photoId);
    expect((await curator.client.loader(readingPage, `/readings/${readingId}`, { readingId })).status).toBe(200);

    expect((await other.client.loader(readingPage, `/readings/${readingId}`, { readingId })).status).toBe(404);
    expect((await customer.client.loader(readingPage, `/readings/${readingId}`, { readingId })).status).toBe(403);
    const theirList = await other.client.loader(readings, "/readings");
    expect(theirList.data.rows.map((r: { id: string }) => r.id)).not.toContain(readingId);
    const ourList = await owner.client.loader(readings, "/readings");
    expect(ourList.data.rows.map((r: { id: string }) => r.id)).toEqual([readingId]);
    const theirApi = await callRoute(readingsApi.loader, authedRequest(other.client, "/api/v1/readings"));
    expect(theirApi.data.items.map((r: { id: string }) => r.id)).not.toContain(readingId);

    const photo = await fetchPhoto(owner.client, photoId!);
    expect(photo.status).toBe(200);
    expect(photo.headers.get("Content-Type")).toBe("image/png");
    expect(photo.headers.get("X-Content-Type-Options")).toBe("nosniff");
    expect(photo.headers.get("Content-Disposition")).toMatch(/^inline/);
    expect(photo.headers.get("Cache-Control")).toMatch(/^private/);
    const bytes = new Uint8Array(await photo.arrayBuffer());
    expect([...bytes.slice(0, 4)]).toEqual([0x89, 0x50, 0x4e, 0x47]);
    expect((await fetchPhoto(curator.client, photoId!)).status).toBe(200);

    const theirs = await fetchPhoto(other.client, photoId!);
    expect(theirs.status).toBe(404);
    expect(await theirs.text()).not.toContain("PNG");
    expect((await fetchPhoto(customer.client, photoId!)).status).toBe(403);
    const anonymous = await fetchPhoto(null, photoId!);
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get("Location")).toMatch(/^\/sign-in/);
    expect((await fetchPhoto(owner.client, "not-a-uuid")).status).toBe(404);
  });

  it("lets a teammate see the reading, and answers 304 to a cached photo", async () => {
    const owner = await installerWithTeam("access-team");
    const module = await createTestModule("team");
    const readingId = await submitGoodReading(owner.client, module.id);
    const { photo_id: photoId } = await db.selectFrom("field_reading").select("photo_id").where("id", "=", readingId).executeTakeFirstOrThrow();
    const first = await fetchPhoto(owner.client, photoId!);
    const etag = first.headers.get("ETag")!;
    const request = authedRequest(owner.client, `/files/${photoId}`, { headers: { "If-None-Match": etag } });
    const cached = (await file.loader({ request, params: { fileId: photoId! }, context: {} } as never)) as Response;
    expect(cached.status).toBe(304);
  });
});
