// /api/v1: JSON bodies that are not JSON, too deep, too big, of the wrong type or not UTF-8; query
// strings out of range; ids that are not ids; the payment webhook's signatures. Plus requests that
// come from another origin (or none) and must be refused before any route.
import Stripe from "stripe";
import { DEMO_SITES } from "../../../data/demo/sites";
import { BAD_IDS, get, postForm, postJson, type Actor, type HostileCase, type SeededIds } from "./hostile-corpus";
import { badChoices } from "./hostile-corpus-planning";
import { binaryBytes, brokenCsv, deepJson, filler, INVALID_UTF8, MEGABYTE, ODD_TEXT } from "./hostile-values";

/** The local payments fake's endpoint secret, the app's default (env.server.ts). */
const WEBHOOK_SECRET = "whsec_local_fake_secret";

/** Bodies every JSON endpoint must refuse, whatever it expects. */
function badBodies(): [string, Partial<HostileCase> & { body: Buffer }][] {
  const json = (text: string | Buffer) => ({ body: typeof text === "string" ? Buffer.from(text) : text });
  return [
    ["not JSON", json("{site:")],
    ["empty body", json("")],
    ["nested 10 000 arrays", json(deepJson(10_000))],
    ["nested 10 000 objects", json(deepJson(10_000, "object"))],
    ["invalid UTF-8", json(Buffer.concat([Buffer.from('{"name":"'), INVALID_UTF8, Buffer.from('"}')]))],
    ["10 MB", json(Buffer.concat([Buffer.from('{"name":"'), filler(10 * MEGABYTE), Buffer.from('"}')]))],
    ["10 MB without Content-Length", { ...json(Buffer.concat([Buffer.from('{"name":"'), filler(10 * MEGABYTE), Buffer.from('"}')])), chunked: true }],
    ["sent as text/plain", { ...json('{"name":"x"}'), contentType: "text/plain" }],
    ["a number", json("12")],
    ["null", json("null")],
  ];
}

export function apiCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const family = "api/v1";
  const post = (label: string, path: string, body: Buffer | string, extra: Partial<HostileCase> = {}, actor: Actor = "installer") =>
    postJson(family, actor, path, label, body, extra);
  for (const path of ["/api/v1/sites", "/api/v1/plans", "/api/v1/plans/preview", "/api/v1/yield", "/api/v1/readings/preview"]) {
    for (const [label, extra] of badBodies()) cases.push(post(`${path}: ${label}`, path, extra.body, extra, path.endsWith("yield") ? "apiKey" : "installer"));
  }
  const site = { ...DEMO_SITES[0].site, name: "API hostile site" };
  const siteWith = (patch: Record<string, unknown>) => JSON.stringify({ ...site, ...patch });
  // Over the API's own 256 KiB JSON limit, under the server's 8 MB: refused by readJsonBody.
  const megabyteSite = siteWith({ notes: "n".repeat(MEGABYTE) });
  cases.push(post("site of 1 MB", "/api/v1/sites", megabyteSite));
  cases.push(post("site of 1 MB without Content-Length", "/api/v1/sites", megabyteSite, { chunked: true }));
  cases.push(post("site latitude 'NaN'", "/api/v1/sites", siteWith({ latitudeDeg: "NaN" })));
  cases.push(post("site latitude 1e308", "/api/v1/sites", siteWith({ latitudeDeg: 1e308 })));
  cases.push(post("site months an object", "/api/v1/sites", siteWith({ months: { 0: {} } })));
  cases.push(post("site months of 1 000 000 entries", "/api/v1/sites", siteWith({ months: new Array(1_000_000).fill(0) })));
  cases.push(post("site name with NUL (otherwise valid)", "/api/v1/sites", siteWith({ name: ODD_TEXT.nul })));
  cases.push(post("site name a lone surrogate (otherwise valid)", "/api/v1/sites", siteWith({ name: "Site \uD800" })));
  cases.push(post("site with __proto__ key", "/api/v1/sites", `{"__proto__":{"admin":true},${siteWith({ latitudeDeg: "x" }).slice(1)}`));
  cases.push(post("site via API key, notes with NUL (otherwise valid)", "/api/v1/sites", siteWith({ notes: ODD_TEXT.nul }), {}, "apiKey"));
  for (const [label, json] of badChoices(ids)) cases.push(post(`plan: ${label}`, "/api/v1/plans", json));
  cases.push(post("yield: months of strings", "/api/v1/yield", JSON.stringify({ site: { ...site, months: Array(12).fill("sunny") } }), {}, "apiKey"));
  cases.push(post("yield: module Pmax -Infinity as text", "/api/v1/yield", JSON.stringify({ site, module: { pmaxW: "-Infinity" } }), {}, "apiKey"));
  const preview = {
    moduleId: ids.moduleId,
    kind: "sweep",
    takenAtLocal: "2026-06-01T12:30",
    utcOffsetH: 2,
    latitudeDeg: 46,
    longitudeDeg: 11,
    tiltDeg: 30,
    azimuthDeg: 180,
    airTempC: 20,
    irradianceSource: "clear-sky-estimate",
    instrument: "Meter",
    method: "Swept the IV curve at noon.",
  };
  cases.push(
    post("reading preview: sweep of NaN text", "/api/v1/readings/preview", JSON.stringify({ ...preview, sweepCsv: "voltage,current\nNaN,Infinity\n" })),
  );
  cases.push(
    post(
      "reading preview: sweep points of wrong types",
      "/api/v1/readings/preview",
      JSON.stringify({ ...preview, sweep: [{ voltageV: "1", currentA: null }] }),
    ),
  );
  cases.push(
    post(
      "reading preview: 100 001 points",
      "/api/v1/readings/preview",
      JSON.stringify({ ...preview, sweep: Array.from({ length: 100_001 }, () => ({ voltageV: 1, currentA: 1 })) }),
    ),
  );
  cases.push(post("reading preview: broken CSV", "/api/v1/readings/preview", JSON.stringify({ ...preview, sweepCsv: brokenCsv("voltage,current") })));
  cases.push(post("alternatives of an unknown plan", `/api/v1/plans/${ids.moduleId}/alternatives`, "{}"));
  cases.push(post("alternatives of a plan id with NUL", "/api/v1/plans/abc%00/alternatives", "{}"));

  const offersImport = (label: string, query: string, body: Buffer | string, contentType: string, extra: Partial<HostileCase> = {}) =>
    post(`offers import: ${label}`, `/api/v1/offers/import${query}`, body, { contentType, ...extra });
  const header =
    "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";
  cases.push(offersImport("broken quoting, written", "?dryRun=false", brokenCsv(header), "text/csv"));
  cases.push(offersImport("binary body named CSV, written", "?dryRun=false", binaryBytes(), "text/csv"));
  cases.push(offersImport("dryRun=maybe", "?dryRun=maybe", `${header}\r\n`, "text/csv"));
  cases.push(offersImport("JSON without csv", "?dryRun=false", '{"file":"x"}', "application/json"));
  cases.push(offersImport("JSON csv a number", "?dryRun=false", '{"csv":12}', "application/json"));
  // Over the import's own 2 MiB limit, under the server's 8 MB: refused by the route itself.
  cases.push(offersImport("3 MB", "?dryRun=false", filler(3 * MEGABYTE, ","), "text/csv"));
  cases.push(offersImport("10 MB", "?dryRun=false", filler(10 * MEGABYTE, ","), "text/csv"));
  cases.push(offersImport("10 MB without Content-Length", "?dryRun=false", filler(10 * MEGABYTE, ","), "text/csv", { chunked: true }));
  cases.push(offersImport("as an image", "?dryRun=false", binaryBytes(), "image/png"));
  cases.push(
    offersImport(
      "a NUL in the supplier (otherwise valid), written",
      "?dryRun=false",
      `${header}\r\nNew\u0000Supplier,module,Fellmark Solar,FM-120M,,EUR,47.90,,,,,,,,\r\n`,
      "text/csv",
    ),
  );
  cases.push(
    offersImport(
      "a row with NUL and bad cells, written",
      "?dryRun=false",
      `${header}\r\nNew\u0000Supplier,module,Harrowgate Cells,HG-100M36,,EUR,NaN,,,,,,,,\r\n`,
      "text/csv",
      {},
    ),
  );

  const read = (label: string, path: string, actor: Actor = "installer") => get(family, actor, path, label);
  for (const query of ["limit=-1", "limit=NaN", "offset=1e309", "minW=Infinity", "sort=password", `q=${encodeURIComponent(ODD_TEXT.nul)}&technology=x`])
    cases.push(read(`modules ?${query}`, `/api/v1/modules?${query}`, "apiKey"));
  for (const query of ["status=maybe", "limit=0", "limit=201", "offset=-1", "limit=1.5"]) cases.push(read(`readings ?${query}`, `/api/v1/readings?${query}`));
  for (const query of ["kind=solar", "quantity=0", "quantity=1e6x", "includeExpired=maybe", `supplierId=${encodeURIComponent(ODD_TEXT.nul)}&quantity=NaN`])
    cases.push(read(`offers ?${query}`, `/api/v1/offers?${query}`));
  for (const query of ["status=bogus", `status=${encodeURIComponent(ODD_TEXT.sql)}`]) cases.push(read(`quotes ?${query}`, `/api/v1/quotes?${query}`));
  cases.push(read("quotes search with NUL", `/api/v1/quotes?q=${encodeURIComponent(ODD_TEXT.nul)}`));
  for (const id of BAD_IDS) {
    for (const resource of ["modules", "sites", "plans", "offers", "quotes"]) cases.push(read(`${resource}/${id.slice(0, 16)}`, `/api/v1/${resource}/${id}`));
  }
  cases.push(read("plan revision 0", `/api/v1/plans/${ids.planId}?revision=0`));
  cases.push(read("plan revision NaN", `/api/v1/plans/${ids.planId}?revision=NaN`));
  cases.push(read("offer quantity -3", `/api/v1/offers/${ids.offerId}?quantity=-3`));
  cases.push(read("unknown endpoint", "/api/v1/nothing-here"));
  cases.push(read("me without credentials", "/api/v1/me", "anonymous"));
  cases.push(get(family, "anonymous", "/api/v1/me", "me with an unknown API key", { headers: { Authorization: `Bearer kw_${"x".repeat(10_000)}` } }));
  cases.push(get(family, "anonymous", "/api/v1/sites", "sites with a malformed Authorization", { headers: { Authorization: "Bearer \u00e9\u00e9" } }));
  cases.push(post("POST to a read-only endpoint", "/api/v1/me", "{}"));
  cases.push(post("POST to an unknown endpoint", "/api/v1/nothing-here", "{}"));
  cases.push(
    post("GET-only yield loader asked with POST of another type", "/api/v1/yield", "a=1", { contentType: "application/x-www-form-urlencoded" }, "apiKey"),
  );

  cases.push(...webhookCases());
  cases.push(...crossOriginCases(ids));
  return cases;
}

function webhookCases(): HostileCase[] {
  const stripe = new Stripe("sk_test_hostile", { telemetry: false });
  const hook = (label: string, body: string | Buffer, signature: string | null, extra: Partial<HostileCase> = {}) =>
    postJson("payments webhook", "anonymous", "/api/v1/payments/webhook", label, body, {
      origin: null,
      headers: signature ? { "Stripe-Signature": signature } : {},
      ...extra,
    });
  const signed = (payload: string) => stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
  const event = JSON.stringify({ id: "evt_hostile", type: "checkout.session.completed", data: { object: { id: "cs_hostile", payment_status: "paid" } } });
  return [
    hook("no signature", event, null),
    hook("signature of another secret", event, stripe.webhooks.generateTestHeaderString({ payload: event, secret: "whsec_not_ours" })),
    hook("signature of another body", `${event} `, signed(event)),
    hook("signature header garbage", event, "t=abc,v1=\u00ff\u00ff"),
    hook("signature from 2001", event, stripe.webhooks.generateTestHeaderString({ payload: event, secret: WEBHOOK_SECRET, timestamp: 1_000_000_000 })),
    hook("signed, not JSON", "{evt", signed("{evt")),
    hook("signed, nested 10 000 levels", deepJson(10_000, "object"), signed(deepJson(10_000, "object"))),
    hook(
      "signed, no id",
      '{"type":"checkout.session.completed","data":{"object":{"id":"cs_x"}}}',
      signed('{"type":"checkout.session.completed","data":{"object":{"id":"cs_x"}}}'),
    ),
    hook("signed, id a number", '{"id":12,"type":"x","data":{"object":{"id":"cs_x"}}}', signed('{"id":12,"type":"x","data":{"object":{"id":"cs_x"}}}')),
    hook(
      "signed, event id with a NUL escape",
      '{"id":"evt_\\u0000","type":"x","data":{"object":{"id":"cs_x"}}}',
      signed('{"id":"evt_\\u0000","type":"x","data":{"object":{"id":"cs_x"}}}'),
    ),
    hook("signed, data null", '{"id":"evt_x","type":"x","data":null}', signed('{"id":"evt_x","type":"x","data":null}')),
    hook("1 MB", Buffer.concat([Buffer.from('{"id":"'), filler(MEGABYTE), Buffer.from('"}')]), "t=1,v1=00"),
    hook("10 MB", Buffer.concat([Buffer.from('{"id":"'), filler(10 * MEGABYTE), Buffer.from('"}')]), "t=1,v1=00"),
    hook("10 MB without Content-Length", filler(10 * MEGABYTE), "t=1,v1=00", { chunked: true }),
    { ...hook("GET", "", null), method: "GET", body: undefined },
  ];
}

function crossOriginCases(ids: SeededIds): HostileCase[] {
  const family = "cross-origin writes";
  const refused = { expect: [403] };
  return [
    postForm(family, "installer", "/sites/new", "site from evil.example", [["name", "x"]], { ...refused, origin: "https://evil.example" }),
    postForm(family, "installer", `/sites/${ids.siteId}`, "delete a site with no Origin or Referer", [["intent", "delete"]], { ...refused, origin: null }),
    postForm(family, "installer", "/sign-out", "sign-out with a Referer of evil.example", [], {
      ...refused,
      origin: null,
      headers: { Referer: "https://evil.example/page" },
    }),
    postForm(family, "customer", `/my-quotes/${ids.sentQuoteId}`, "approve from a look-alike origin", [["intent", "approve"]], {
      ...refused,
      origin: "http://app.kitwright.test.evil.example",
    }),
    postForm(family, "installer", `/quotes/${ids.sentQuoteId}`, "withdraw from Origin null", [["intent", "withdraw"]], { ...refused, origin: "null" }),
    postJson(family, "installer", "/api/v1/sites", "API site with the session cookie from evil.example", "{}", { ...refused, origin: "https://evil.example" }),
    postJson(family, "installer", "/api/v1/plans", "API plan with a cookie and no Origin", "{}", { ...refused, origin: null }),
    postForm(
      family,
      "admin",
      "/admin/users",
      "role change from https:// of our own host",
      [
        ["userId", ids.otherUserId],
        ["role", "admin"],
      ],
      { ...refused, origin: "https://app.kitwright.test" },
    ),
  ];
}
