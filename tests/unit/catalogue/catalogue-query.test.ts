// The list query from URL parameters: typed values, names of the bad ones, and a fallback.
import { describe, expect, it } from "vitest";
import { parsePartQuery } from "~/lib/catalogue-query";

describe("catalogue list query", () => {
  it("parses filters, sort and paging", () => {
    const parsed = parsePartQuery(
      "modules",
      new URLSearchParams("q= harrow &technology=poly&minW=50&maxW=200&hasReadings=true&ratioBelow=0.9&sort=verifiedRatio&dir=desc&limit=25&offset=50"),
    );
    expect(parsed).toEqual({
      ok: true,
      query: expect.objectContaining({
        q: "harrow",
        sort: "verifiedRatio",
        dir: "desc",
        limit: 25,
        offset: 50,
        modules: { technology: "poly", minW: 50, maxW: 200, hasReadings: true, ratioBelow: 0.9 },
      }),
    });
  });

  it("defaults to the first page sorted by maker", () => {
    const parsed = parsePartQuery("modules", new URLSearchParams());
    expect(parsed.ok && parsed.query).toMatchObject({ q: "", sort: "maker", dir: "asc", limit: 50, offset: 0 });
  });

  it("names every bad parameter and drops only those in the fallback", () => {
    const parsed = parsePartQuery("modules", new URLSearchParams("sort=price&limit=500&minW=abc&technology=poly&hasReadings=maybe"));
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(Object.keys(parsed.fields).sort()).toEqual(["hasReadings", "limit", "minW", "sort"]);
    expect(parsed.fields.sort).toMatch(/sort must be one of: maker, pmaxW/);
    expect(parsed.fields.limit).toBe("limit must be a whole number from 1 to 200.");
    expect(parsed.fallback.modules.technology).toBe("poly");
    expect(parsed.fallback.limit).toBe(50);
  });

  it("refuses a power range that runs backwards", () => {
    const parsed = parsePartQuery("modules", new URLSearchParams("minW=300&maxW=100"));
    expect(parsed.ok ? null : parsed.fields).toEqual({ maxW: "maxW must not be below minW." });
  });

  it("takes each kind's own filter and sort keys", () => {
    const batteries = parsePartQuery("batteries", new URLSearchParams("chemistry=lifepo4&sort=usableEnergyKWh"));
    expect(batteries.ok && batteries.query).toMatchObject({ chemistry: "lifepo4", sort: "usableEnergyKWh" });
    const inverters = parsePartQuery("inverters", new URLSearchParams("dcV=48&sort=pmaxW"));
    expect(inverters.ok ? null : Object.keys(inverters.fields)).toEqual(["sort"]);
  });
});
