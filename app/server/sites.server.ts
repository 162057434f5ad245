// Sites: every query carries the acting team's id, so another team's id simply finds nothing.
import { db } from "./db.server";
import type { SiteForm } from "~/lib/site-forms";
import { isUuid } from "./modules.server";

function columns(form: SiteForm) {
  return {
    name: form.name,
    customer_name: form.customerName,
    customer_email: form.customerEmail ?? null,
    customer_phone: form.customerPhone || null,
    latitude_deg: form.latitudeDeg,
    longitude_deg: form.longitudeDeg,
    elevation_m: form.elevationM,
    time_zone: form.timeZone,
    tilt_deg: form.tiltDeg,
    azimuth_deg: form.azimuthDeg,
    albedo: form.albedo,
    shading_derate_pct: form.shadingDeratePct,
    coldest_temp_c: form.coldestTempC,
    // Blank in an edit clears it: the check goes back to the hottest month's mean daily maximum.
    hottest_temp_c: form.hottestTempC ?? null,
    irradiance_source: form.irradianceSource,
    clearness_preset: form.irradianceSource === "clearness-preset" ? (form.clearnessPreset ?? null) : null,
    months: JSON.stringify(form.months),
    notes: form.notes ?? "",
  };
}

export function listSites(teamId: string) {
  return db
    .selectFrom("site")
    .select(["id", "name", "customer_name", "latitude_deg", "longitude_deg", "tilt_deg", "azimuth_deg", "irradiance_source", "clearness_preset", "updated_at"])
    .where("team_id", "=", teamId)
    .orderBy("updated_at", "desc")
    .execute();
}

export async function findSite(teamId: string, siteId: string) {
  if (!isUuid(siteId)) return undefined;
  return db.selectFrom("site").selectAll().where("team_id", "=", teamId).where("id", "=", siteId).executeTakeFirst();
}

export async function createSite(teamId: string, userId: string | null, form: SiteForm) {
  const row = await db
    .insertInto("site")
    .values({ ...columns(form), team_id: teamId, created_by: userId })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateSite(teamId: string, siteId: string, form: SiteForm) {
  const result = await db
    .updateTable("site")
    .set({ ...columns(form), updated_at: new Date() })
    .where("team_id", "=", teamId)
    .where("id", "=", siteId)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) > 0;
}

/** A stored site back in the form's shape (for editing and for the API). */
export function siteToForm(site: NonNullable<Awaited<ReturnType<typeof findSite>>>): SiteForm {
  return {
    name: site.name,
    customerName: site.customer_name,
    customerEmail: site.customer_email ?? undefined,
    customerPhone: site.customer_phone ?? undefined,
    latitudeDeg: site.latitude_deg,
    longitudeDeg: site.longitude_deg,
    elevationM: site.elevation_m,
    timeZone: site.time_zone,
    tiltDeg: site.tilt_deg,
    azimuthDeg: site.azimuth_deg,
    albedo: site.albedo,
    shadingDeratePct: site.shading_derate_pct,
    coldestTempC: site.coldest_temp_c,
    hottestTempC: site.hottest_temp_c ?? undefined,
    irradianceSource: site.irradiance_source,
    clearnessPreset: (site.clearness_preset ?? undefined) as SiteForm["clearnessPreset"],
    months: site.months as SiteForm["months"],
    notes: site.notes,
  };
}
