// Field readings (installer): the multipart form with its photo and sweep file; review and
// decisions (curator); evidence files.
import { demoModulePhoto } from "../../../scripts/lib/demo-photo";
import { badIdPaths, badNumberCases, get, postForm, postMultipart, withField, without, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FilePart, FormFields } from "./hostile-http";
import { binaryBytes, brokenCsv, filler, MEGABYTE, ODD_TEXT, pngHeaderWithGarbage } from "./hostile-values";

export function readingCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const family = "field readings";
  const base = readingFields(ids.moduleId);
  const photo = (bytes: Buffer, filename = "module.png", type = "image/png"): FilePart => ({ name: "photo", filename, type, bytes });
  const good = photo(demoModulePhoto(2, 60, 40));
  const make = (label: string, fields: FormFields, files: FilePart[] = [good], extra = {}) =>
    postMultipart(family, "installer", "/readings/new", label, fields, files, extra);
  const notAnImage = { expectText: /not a JPEG, PNG or WebP image/ };
  cases.push(make("a text file named .jpg", base, [photo(Buffer.from("just some text, not a picture\n"), "module.jpg", "image/jpeg")], notAnImage));
  cases.push(make("a PNG header with garbage", base, [photo(pngHeaderWithGarbage(), "module.png")], notAnImage));
  cases.push(
    make(
      "an SVG with a script named .png",
      base,
      [photo(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'), "module.png")],
      notAnImage,
    ),
  );
  cases.push(make("an empty photo", base, [photo(Buffer.alloc(0))]));
  cases.push(make("no photo", base, []));
  cases.push(make("a 10 MB photo", base, [photo(Buffer.concat([demoModulePhoto(1, 20, 20), filler(10 * MEGABYTE)]))]));
  cases.push(make("a 10 MB photo, chunked", base, [photo(filler(10 * MEGABYTE))], { chunked: true }));
  // Under the server's 8 MB body limit but over the form's own 6 MB: refused by the route itself.
  cases.push(make("a 7 MB photo", base, [photo(Buffer.concat([demoModulePhoto(1, 20, 20), filler(7 * MEGABYTE)]))]));
  cases.push(make("a 7 MB photo, chunked", base, [photo(Buffer.concat([demoModulePhoto(1, 20, 20), filler(7 * MEGABYTE)]))], { chunked: true }));
  cases.push(
    make("sweep: binary file named .csv", withField(without(base, "measuredPmaxW"), "kind", "sweep"), [
      good,
      { name: "sweepFile", filename: "sweep.csv", type: "text/csv", bytes: binaryBytes() },
    ]),
  );
  cases.push(
    make("sweep: broken quoting", withField(without(base, "measuredPmaxW"), "kind", "sweep"), [
      good,
      { name: "sweepFile", filename: "sweep.csv", type: "text/csv", bytes: Buffer.from(brokenCsv("voltage,current")) },
    ]),
  );
  cases.push(
    make("sweep: NaN and Infinity points", withField(without(base, "measuredPmaxW"), "kind", "sweep"), [
      good,
      { name: "sweepFile", filename: "sweep.csv", type: "text/csv", bytes: Buffer.from("voltage,current\nNaN,1\nInfinity,2\n-1,-1\n1e309,0\n") },
    ]),
  );
  cases.push(make("sweep: no file", withField(without(base, "measuredPmaxW"), "kind", "sweep")));
  const numeric = ["measuredPmaxW", "utcOffsetH", "latitudeDeg", "longitudeDeg", "tiltDeg", "azimuthDeg", "airTempC", "irradianceWm2"];
  cases.push(...badNumberCases((label, fields) => make(label, fields), base, numeric));
  cases.push(make("power -95 W", withField(base, "measuredPmaxW", "-95")));
  cases.push(make("multipart field at list position 99 999 999", [...base, ["extra[99999999]", "x"]]));
  cases.push(make("unknown module", withField(base, "moduleId", "00000000-0000-4000-8000-000000000000")));
  cases.push(make("module id with SQL", withField(base, "moduleId", ODD_TEXT.sql)));
  cases.push(make("taken on 31 February", withField(base, "takenAtLocal", "2026-02-31T12:00")));
  cases.push(make("method with NUL (otherwise valid)", withField(base, "method", `Measured ${ODD_TEXT.nul} at solar noon with care.`)));
  cases.push(make("instrument with NUL, method too short", withField(withField(base, "instrument", ODD_TEXT.nul), "method", "short")));
  cases.push({ ...make("multipart cut off mid-body", base), ...truncated(base) });
  cases.push(postForm(family, "installer", "/readings/new", "urlencoded instead of multipart", base));
  cases.push({ ...make("wrong boundary", base), contentType: "multipart/form-data; boundary=nothing-like-the-body" });

  const decide = (label: string, path: string, fields: FormFields) => postForm("review", "curator", path, label, fields);
  cases.push(
    decide("no decision", "/review", [
      ["intent", "decide"],
      ["readingId", ids.readingId],
    ]),
  );
  cases.push(
    decide("reject without reason", "/review", [
      ["intent", "decide"],
      ["readingId", ids.readingId],
      ["decision", "rejected"],
    ]),
  );
  cases.push(
    decide("decision 'maybe'", "/review", [
      ["intent", "decide"],
      ["readingId", ids.readingId],
      ["decision", "maybe"],
    ]),
  );
  cases.push(
    decide("reading id with SQL", "/review", [
      ["intent", "decide"],
      ["readingId", ODD_TEXT.sql],
      ["decision", "approved"],
    ]),
  );
  cases.push(
    decide("unknown reading", "/review", [
      ["intent", "decide"],
      ["readingId", "00000000-0000-4000-8000-000000000000"],
      ["decision", "approved"],
    ]),
  );
  cases.push(
    decide("bulk of 101 readings", "/review", [
      ["intent", "bulk"],
      ["decision", "approved"],
      ...Array.from({ length: 101 }, (_, i): [string, string] => [`readingIds[${i}]`, ids.readingId]),
    ]),
  );
  cases.push(
    decide("bulk with garbage ids", "/review", [
      ["intent", "bulk"],
      ["decision", "approved"],
      ["readingIds[0]", "x"],
      ["readingIds[1]", ODD_TEXT.nul],
    ]),
  );
  cases.push(
    decide("reason of 10 MB", `/readings/${ids.readingId}`, [
      ["intent", "decide"],
      ["readingId", ids.readingId],
      ["decision", "rejected"],
      ["reason", filler(10 * MEGABYTE).toString()],
    ]),
  );
  for (const { id, path } of badIdPaths((id) => `/readings/${id}`).slice(0, 4))
    cases.push(
      decide(`decide on page of reading ${id.slice(0, 20)}`, path, [
        ["intent", "decide"],
        ["readingId", ids.readingId],
      ]),
    );
  for (const { id, path } of badIdPaths((id) => `/files/${id}`)) cases.push(get("review", "curator", path, `evidence file ${id.slice(0, 20)}`));
  cases.push(get(family, "installer", `/readings?status=${encodeURIComponent(ODD_TEXT.nul)}&page=NaN`, "list with a NUL status", { expect: "not5xx" }));
  return cases;
}

/** A valid single reading, but for its photo. */
export function readingFields(
  moduleId: string,
  instrument = "Clamp meter and pyranometer",
  method = "Measured at solar noon with the module clean and unshaded.",
): FormFields {
  return [
    ["moduleId", moduleId],
    ["kind", "single"],
    ["measuredPmaxW", "95"],
    ["takenAtLocal", "2026-06-01T12:30"],
    ["utcOffsetH", "2"],
    ["latitudeDeg", "46.5"],
    ["longitudeDeg", "11.2"],
    ["tiltDeg", "30"],
    ["azimuthDeg", "180"],
    ["airTempC", "21"],
    ["irradianceSource", "pyranometer"],
    ["irradianceWm2", "960"],
    ["instrument", instrument],
    ["method", method],
  ];
}

/** A multipart body that stops in the middle of the photo, declared at its true (short) length. */
function truncated(fields: FormFields) {
  const boundary = "----hostile-truncated";
  const head = fields.map(([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`).join("");
  const body = Buffer.concat([
    Buffer.from(`${head}--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="m.png"\r\nContent-Type: image/png\r\n\r\n`),
    demoModulePhoto(0, 20, 20).subarray(0, 50),
  ]);
  return { body, contentType: `multipart/form-data; boundary=${boundary}` };
}
