// Parts, suppliers and offers for the sourcing integration tests. Each call makes a maker name of its
// own, so tests can find exactly their rows in the shared database.
import { db } from "~/server/db.server";
import type { RouteClient } from "../helpers/route-client";
import * as supplierNew from "~/routes/sourcing.supplier-new";
import * as offerNew from "~/routes/sourcing.offer-new";
import { expect } from "vitest";

let counter = 0;
export function uniqueMaker(label: string) {
  counter += 1;
  return `Srcmaker ${label} ${Date.now().toString(36)}${counter}`;
}

/** A module with, optionally, verified figures as the catalogue keeps them after approved readings. */
export async function insertModule(maker: string, model: string, pmaxW: number, verifiedPmaxW: number | null = null, size = { lengthMm: 1480, widthMm: 670 }) {
  const row = await db
    .insertInto("pv_module")
    .values({
      maker,
      model,
      cell_technology: "poly",
      cells_in_series: 36,
      pmax_w: pmaxW,
      vmp_v: 18,
      imp_a: pmaxW / 18,
      voc_v: 22,
      isc_a: (pmaxW / 18) * 1.07,
      gamma_pmax_pct_per_c: -0.4,
      beta_voc_pct_per_c: -0.3,
      alpha_isc_pct_per_c: 0.05,
      noct_c: 45,
      length_mm: size.lengthMm,
      width_mm: size.widthMm,
      mass_kg: 10,
      verified_pmax_w: verifiedPmaxW,
      verified_reading_count: verifiedPmaxW === null ? 0 : 3,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function insertBattery(maker: string, model: string) {
  const row = await db
    .insertInto("battery")
    .values({
      maker,
      model,
      chemistry: "lifepo4",
      nominal_voltage_v: 12.8,
      capacity_ah: 100,
      capacity_hour_rate_h: 5,
      usable_dod_pct: 90,
      cycle_life: 4000,
      round_trip_efficiency_pct: 95,
      mass_kg: 12,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function addSupplier(client: RouteClient, name: string, currency = "EUR", extra: Record<string, string> = {}) {
  const result = await client.action(supplierNew, "/sourcing/suppliers/new", { name, currency, ...extra });
  expect(result.status, JSON.stringify(result.data)).toBe(302);
  return result.location!.split("/").pop()!;
}

export function offerForm(supplierId: string, partId: string, overrides: Record<string, string> = {}) {
  return { supplierId, partKind: "modules", partId, unitPrice: "58.50", ...overrides };
}

export async function addOffer(client: RouteClient, form: Record<string, string>) {
  const result = await client.action(offerNew, "/sourcing/offers/new", form);
  expect(result.status, JSON.stringify(result.data)).toBe(302);
  return result.location!.split("/").pop()!;
}

export async function callApi(
  mod: { loader?: Function; action?: Function },
  kind: "loader" | "action",
  path: string,
  init: { headers?: Record<string, string>; body?: string; contentType?: string; params?: Record<string, string> } = {},
) {
  const request = new Request(`http://127.0.0.1:3999${path}`, {
    method: kind === "action" ? "POST" : "GET",
    headers: { ...(init.contentType ? { "Content-Type": init.contentType } : {}), ...init.headers },
    body: kind === "action" ? init.body : undefined,
  });
  try {
    const res = (await mod[kind]!({ request, params: init.params ?? {}, context: {} })) as Response;
    return { status: res.status, body: await res.json() };
  } catch (thrown) {
    if (!(thrown instanceof Response)) throw thrown;
    return { status: thrown.status, body: await thrown.json() };
  }
}
