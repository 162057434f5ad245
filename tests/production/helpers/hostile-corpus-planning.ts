// Sites, load sheets (a JSON document in a hidden field), kit plans (choices as JSON) and kit
// alternatives, all as the installer of the seeded team.
import { DEMO_SITES } from "../../../data/demo/sites";
import { DEFAULT_DESIGN } from "../../../app/lib/plan-choices";
import { badIdPaths, badNumberCases, postForm, toFields, withField, without, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FormFields } from "./hostile-http";
import { deepJson, filler, MEGABYTE, ODD_TEXT } from "./hostile-values";

export function siteFormFields(name = "Hostile test site"): FormFields {
  return toFields({ ...DEMO_SITES[0].site, name });
}

export function validSheet(applianceName = "Fridge") {
  return { name: "Hostile test loads", appliances: [{ name: applianceName, powerW: 60, quantity: 1, hoursPerDay: 8, daysPerWeek: 7, circuit: "dc" }] };
}

export function siteCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const base = siteFormFields();
  const numeric = [
    "latitudeDeg",
    "longitudeDeg",
    "elevationM",
    "tiltDeg",
    "azimuthDeg",
    "albedo",
    "shadingDeratePct",
    "coldestTempC",
    "months[0].tMaxC",
    "months[5].tMinC",
    "months[11].ghiKWhM2Day",
  ];
  const create = (label: string, fields: FormFields) => postForm("sites", "installer", "/sites/new", `new site: ${label}`, fields);
  cases.push(...badNumberCases(create, base, numeric));
  cases.push(create("latitude 91°", withField(base, "latitudeDeg", "91")));
  cases.push(create("13 months", withField(base, "months[12].tMaxC", "5")));
  cases.push(create("month index 99999999", withField(base, "months[99999999].tMaxC", "5")));
  cases.push(create("field name nested 10 000 levels", withField(base, `months[0].${Array(10_000).fill("x").join(".")}`, "5")));
  cases.push(create("one month missing", without(base, "months[3].tMaxC", "months[3].tMinC", "months[3].ghiKWhM2Day", "months[3].albedo")));
  cases.push(create("time zone Mars/Olympus", withField(base, "timeZone", "Mars/Olympus")));
  cases.push(create("time zone with NUL", withField(base, "timeZone", "Europe/Vienna\u0000")));
  cases.push(create("irradiance source 'guess'", withField(base, "irradianceSource", "guess")));
  cases.push(create("customer e-mail with RTL override", withField(base, "customerEmail", "a@exa\u202Emple.org")));
  cases.push(create("notes of 10 MB", withField(base, "notes", filler(10 * MEGABYTE))));
  cases.push(create("__proto__ field", [...base, ["__proto__.polluted", "yes"], ["constructor.prototype.polluted", "yes"], ["latitudeDeg", "NaN"]]));
  for (const [key, text] of Object.entries(ODD_TEXT)) cases.push(create(`name ${key}, tilt missing`, withField(without(base, "tiltDeg"), "name", text)));
  cases.push(create("name with NUL (otherwise valid)", withField(base, "name", ODD_TEXT.nul)));
  cases.push(create("notes with NUL (otherwise valid)", withField(base, "notes", `Roof ${ODD_TEXT.nul} faces south.`)));

  const edit = (label: string, path: string, fields: FormFields) => postForm("sites", "installer", path, `edit site: ${label}`, fields);
  cases.push(edit("elevation 9001 m", `/sites/${ids.siteId}`, withField(base, "elevationM", "9001")));
  cases.push(edit("coldest above a month's minimum", `/sites/${ids.siteId}`, withField(base, "coldestTempC", "39")));
  cases.push(edit("another team's site, delete", `/sites/${ids.otherTeamSiteId}`, [["intent", "delete"]]));
  for (const { id, path } of badIdPaths((id) => `/sites/${id}`)) cases.push(edit(`site ${id.slice(0, 20)}, delete`, path, [["intent", "delete"]]));

  const sheetPath = `/sites/${ids.siteId}/loads/new`;
  const sheet = (label: string, value: string | Buffer, path = sheetPath) =>
    postForm("load sheets", "installer", path, `load sheet: ${label}`, [["sheet", value]]);
  const appliance = validSheet().appliances[0];
  const withAppliance = (patch: Record<string, unknown>) => JSON.stringify({ ...validSheet(), appliances: [{ ...appliance, ...patch }] });
  cases.push(sheet("not JSON", "{name: 'x'"));
  cases.push(sheet("JSON nested 10 000 levels", deepJson(10_000)));
  cases.push(sheet("JSON nested 10 000 objects", deepJson(10_000, "object")));
  cases.push(sheet("an array", "[1,2,3]"));
  cases.push(sheet("null", "null"));
  cases.push(sheet("field missing", ""));
  cases.push(sheet("quantity -1", withAppliance({ quantity: -1 })));
  cases.push(sheet("quantity 'NaN'", withAppliance({ quantity: "NaN" })));
  cases.push(sheet("quantity 1.5", withAppliance({ quantity: 1.5 })));
  cases.push(sheet("power 1e308", withAppliance({ powerW: 1e308 })));
  cases.push(sheet("power 'Infinity'", withAppliance({ powerW: "Infinity" })));
  cases.push(sheet("hours 25", withAppliance({ hoursPerDay: 25 })));
  cases.push(sheet("circuit 'ac/dc'", withAppliance({ circuit: "ac/dc" })));
  cases.push(sheet("month 13", withAppliance({ months: [13] })));
  cases.push(sheet("201 appliances", JSON.stringify({ ...validSheet(), appliances: Array.from({ length: 201 }, () => appliance) })));
  cases.push(sheet("appliance name with NUL (otherwise valid)", withAppliance({ name: ODD_TEXT.nul })));
  cases.push(sheet("appliance name a lone surrogate (otherwise valid)", withAppliance({ name: "Fridge \uD800" })));
  cases.push(sheet("sheet name with NUL escape (otherwise valid)", JSON.stringify({ ...validSheet(), name: "Loads \u0000" })));
  cases.push(sheet("10 MB", Buffer.concat([Buffer.from('{"name":"'), filler(10 * MEGABYTE), Buffer.from('"}')])));
  const existing = `/sites/${ids.siteId}/loads/${ids.loadSheetId}`;
  cases.push(sheet("edit: hours -1", withAppliance({ hoursPerDay: -1 }), existing));
  cases.push(sheet("edit: appliance name with NUL (otherwise valid)", withAppliance({ name: ODD_TEXT.nul }), existing));
  for (const { id, path } of badIdPaths((id) => `/sites/${ids.siteId}/loads/${id}`))
    cases.push(sheet(`load sheet ${id.slice(0, 20)}`, withAppliance({}), path));
  for (const { id, path } of badIdPaths((id) => `/sites/${id}/loads/new`).slice(0, 4))
    cases.push(sheet(`new on site ${id.slice(0, 20)}`, withAppliance({}), path));
  return cases;
}

export function validChoices(ids: SeededIds, name = "Hostile test plan") {
  return {
    name,
    siteId: ids.siteId,
    loadSheetId: ids.loadSheetId,
    systemVoltageV: 24,
    moduleId: ids.moduleId,
    controllerId: ids.controllerId,
    batteryId: ids.batteryId,
    inverterId: ids.inverterId,
    design: DEFAULT_DESIGN,
  };
}

/** Choices that must be refused, as JSON text: shared by the plan pages and the plans API. */
export function badChoices(ids: SeededIds): [string, string][] {
  const valid = validChoices(ids);
  const design = (patch: Record<string, unknown>) => JSON.stringify({ ...valid, design: { ...DEFAULT_DESIGN, ...patch } });
  return [
    ["not JSON", "{choices"],
    ["nested 10 000 levels", deepJson(10_000)],
    ["a string", '"plan"'],
    ["voltage 36 V", JSON.stringify({ ...valid, systemVoltageV: 36 })],
    ["voltage '24'", JSON.stringify({ ...valid, systemVoltageV: "24" })],
    ["autonomy 'NaN'", design({ autonomyDays: "NaN" })],
    ["autonomy 1e308", design({ autonomyDays: 1e308 })],
    ["losses nested wrong", design({ lossesPct: [1, 2, 3] })],
    ["modules in series only", design({ modulesInSeries: 2 })],
    ["strings -1", design({ modulesInSeries: 1, stringsInParallel: -1 })],
    ["seed 2^53", design({ simulationSeed: 2 ** 53 })],
    ["unknown site", JSON.stringify({ ...valid, siteId: "00000000-0000-4000-8000-000000000000" })],
    ["another team's site", JSON.stringify({ ...valid, siteId: ids.otherTeamSiteId })],
    ["module id with SQL", JSON.stringify({ ...valid, moduleId: ODD_TEXT.sql })],
    ["battery is the module", JSON.stringify({ ...valid, batteryId: ids.moduleId })],
    ["name with NUL (otherwise valid)", JSON.stringify({ ...valid, name: ODD_TEXT.nul })],
    ["name a lone surrogate (otherwise valid)", JSON.stringify({ ...valid, name: "Plan \uD800" })],
  ];
}

export function planCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const form = (label: string, path: string, fields: FormFields) => postForm("kit plans", "installer", path, label, fields);
  for (const [label, json] of badChoices(ids)) cases.push(form(`new plan: ${label}`, "/plans/new", [["choices", json]]));
  cases.push(form("new plan: choices of 10 MB", "/plans/new", [["choices", filler(10 * MEGABYTE)]]));
  const planPath = `/plans/${ids.planId}`;
  for (const [label, json] of badChoices(ids).slice(0, 8))
    cases.push(
      form(`revise plan: ${label}`, planPath, [
        ["choices", json],
        ["note", ODD_TEXT.html],
      ]),
    );
  cases.push(form("revise plan: name with NUL (otherwise valid)", planPath, [["choices", JSON.stringify(validChoices(ids, ODD_TEXT.nul))]]));
  cases.push(
    form("override: reason too short", planPath, [
      ["intent", "override"],
      ["checkId", "voc-cold"],
      ["reason", "ok"],
    ]),
  );
  cases.push(
    form("override: check that is not failing", planPath, [
      ["intent", "override"],
      ["checkId", "not-a-check"],
      ["reason", "Accepted after a long talk with the customer."],
    ]),
  );
  cases.push(
    form("override: check id of 10 MB", planPath, [
      ["intent", "override"],
      ["checkId", filler(10 * MEGABYTE)],
      ["reason", "Accepted after a long talk."],
    ]),
  );
  cases.push(
    form("override: check id with NUL", planPath, [
      ["intent", "override"],
      ["checkId", "voc\u0000"],
      ["reason", "Accepted after a long talk."],
    ]),
  );
  for (const { id, path } of badIdPaths((id) => `/plans/${id}`)) cases.push(form(`plan ${id.slice(0, 20)}: re-plan`, path, [["intent", "replan-current"]]));

  const pick = toFields({
    moduleId: ids.moduleId,
    controllerId: ids.controllerId,
    batteryId: ids.batteryId,
    inverterId: ids.inverterId,
    modulesInSeries: 1,
    stringsInParallel: 2,
    batteryStrings: 1,
  });
  const alt = (label: string, fields: FormFields, path = `/plans/${ids.planId}/alternatives`) =>
    postForm("kit plans", "installer", path, `use alternative: ${label}`, fields);
  cases.push(...badNumberCases(alt, pick, ["modulesInSeries", "stringsInParallel", "batteryStrings"]).slice(0, 6));
  cases.push(alt("strings 101", withField(pick, "stringsInParallel", "101")));
  cases.push(alt("module id with SQL", withField(pick, "moduleId", ODD_TEXT.sql)));
  cases.push(alt("unknown controller", withField(pick, "controllerId", "00000000-0000-4000-8000-000000000000")));
  for (const { id, path } of badIdPaths((id) => `/plans/${id}/alternatives`).slice(0, 4)) cases.push(alt(`plan ${id.slice(0, 20)}`, pick, path));
  return cases;
}
