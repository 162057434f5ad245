// Catalogue (curator): new and edited parts of each kind, CSV import, merging, list queries.
import { DEMO_BATTERIES, DEMO_CONTROLLERS, DEMO_INVERTERS } from "../../../data/demo/parts";
import { DEMO_MODULES } from "../../../data/demo/modules";
import { demoModulePhoto } from "../../../scripts/lib/demo-photo";
import { badIdPaths, badNumberCases, get, postForm, postMultipart, toFields, withField, without, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FilePart, FormFields } from "./hostile-http";
import { binaryBytes, brokenCsv, filler, MEGABYTE, ODD_TEXT } from "./hostile-values";

const unique = { maker: "Hostile Test Works", model: "HT-0001" };

export function catalogueCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const family = "catalogue";
  const bases = {
    modules: toFields({ ...DEMO_MODULES[0], nominalTempKind: "noct", ...unique }),
    batteries: toFields({ ...DEMO_BATTERIES[0], ...unique }),
    controllers: toFields({ ...DEMO_CONTROLLERS[0], ...unique }),
    inverters: toFields({ ...DEMO_INVERTERS[0], ...unique }),
  };
  for (const [kind, base] of Object.entries(bases)) {
    const path = `/catalogue/${kind}/new`;
    const numeric = base.filter(([, v]) => typeof v === "string" && v !== "" && !Number.isNaN(Number(v))).map(([k]) => k);
    const make = (label: string, fields: FormFields) => postForm(family, "curator", path, `new ${kind}: ${label}`, fields);
    cases.push(...badNumberCases(make, base, numeric, kind === "modules" ? 1 : 0));
    cases.push(make("maker missing", without(base, "maker")));
    cases.push(make("model of 10 MB", withField(base, "model", filler(10 * MEGABYTE))));
    cases.push(make("maker with NUL (otherwise valid)", withField(base, "maker", ODD_TEXT.nul)));
  }
  cases.push(postForm(family, "curator", "/catalogue/widgets/new", "new part of an unknown kind", bases.modules));
  for (const { id, path } of badIdPaths((id) => `/catalogue/modules/${id}/edit`))
    cases.push(postForm(family, "curator", path, `edit module ${id.slice(0, 20)}`, bases.modules));
  const editPath = `/catalogue/modules/${ids.moduleId}/edit`;
  cases.push(postForm(family, "curator", editPath, "edit module: Voc below Vmp", withField(withField(bases.modules, "vocV", "1"), "maker", ODD_TEXT.html)));
  cases.push(postForm(family, "curator", editPath, "edit module: negative cells", withField(bases.modules, "cellsInSeries", "-36")));
  cases.push(
    postForm(family, "curator", `/catalogue/batteries/${ids.batteryId}/edit`, "edit battery: DoD 250 %", withField(bases.batteries, "usableDodPct", "250")),
  );

  const merge = (label: string, moduleId: string, fields: FormFields) =>
    postForm(family, "curator", `/catalogue/modules/${moduleId}/merge`, `merge: ${label}`, fields);
  cases.push(merge("survivor missing", ids.mergeDuplicateId, [["confirm", "yes"]]));
  cases.push(
    merge("survivor not a uuid", ids.mergeDuplicateId, [
      ["survivorId", "'; DROP TABLE pv_module; --"],
      ["confirm", "yes"],
    ]),
  );
  cases.push(
    merge("survivor unknown", ids.mergeDuplicateId, [
      ["survivorId", "00000000-0000-4000-8000-000000000000"],
      ["confirm", "yes"],
    ]),
  );
  cases.push(
    merge("into itself", ids.mergeDuplicateId, [
      ["survivorId", ids.mergeDuplicateId],
      ["confirm", "yes"],
    ]),
  );
  cases.push(merge("not confirmed", ids.mergeDuplicateId, [["survivorId", ids.moduleId]]));
  for (const { id } of badIdPaths((id) => id).slice(0, 4))
    cases.push(
      merge(`duplicate ${id.slice(0, 20)}`, id, [
        ["survivorId", ids.moduleId],
        ["confirm", "yes"],
      ]),
    );

  const csv = (label: string, fields: FormFields, files: FilePart[] = [], extra = {}) =>
    postMultipart(family, "curator", "/catalogue/import", `import: ${label}`, fields, files, extra);
  const moduleHeader =
    "maker,model,cell_technology,cells_in_series,pmax_w,vmp_v,imp_a,voc_v,isc_a,gamma_pmax_pct_per_c,beta_voc_pct_per_c,alpha_isc_pct_per_c,nominal_temp_kind,noct_c,length_mm,width_mm,mass_kg";
  cases.push(
    csv("broken quoting", [
      ["kind", "modules"],
      ["intent", "import"],
      ["csvText", brokenCsv(moduleHeader)],
    ]),
  );
  cases.push(
    csv(
      "binary file named .csv",
      [
        ["kind", "modules"],
        ["intent", "import"],
      ],
      [{ name: "file", filename: "modules.csv", type: "text/csv", bytes: binaryBytes() }],
    ),
  );
  cases.push(
    csv(
      "PNG named .csv",
      [
        ["kind", "batteries"],
        ["intent", "import"],
      ],
      [{ name: "file", filename: "parts.csv", type: "text/csv", bytes: demoModulePhoto(0, 40, 30) }],
    ),
  );
  // Over the import's own 2 MiB limit, under the server's 8 MB: refused by the route itself.
  cases.push(
    csv(
      "file of 3 MB",
      [
        ["kind", "modules"],
        ["intent", "import"],
      ],
      [{ name: "file", filename: "big.csv", type: "text/csv", bytes: filler(3 * MEGABYTE, "1") }],
    ),
  );
  cases.push(
    csv(
      "file of 10 MB",
      [
        ["kind", "modules"],
        ["intent", "import"],
      ],
      [{ name: "file", filename: "big.csv", type: "text/csv", bytes: filler(10 * MEGABYTE, "1") }],
    ),
  );
  cases.push(
    csv(
      "file of 10 MB, chunked",
      [
        ["kind", "modules"],
        ["intent", "import"],
      ],
      [{ name: "file", filename: "big.csv", type: "text/csv", bytes: filler(10 * MEGABYTE, "1") }],
      { chunked: true },
    ),
  );
  cases.push(
    csv("unknown kind", [
      ["kind", "widgets"],
      ["intent", "import"],
      ["csvText", `${moduleHeader}\r\n`],
    ]),
  );
  cases.push(
    csv("unknown intent", [
      ["kind", "modules"],
      ["intent", "drop"],
      ["csvText", `${moduleHeader}\r\n`],
    ]),
  );
  cases.push(
    csv("empty", [
      ["kind", "modules"],
      ["intent", "import"],
      ["csvText", "   "],
    ]),
  );
  cases.push(
    csv("header only, NUL in a cell row", [
      ["kind", "modules"],
      ["intent", "import"],
      ["csvText", `${moduleHeader}\r\nA\u0000,B,mono-PERC,36,NaN,1,1,1,1,1,1,1,noct,45,1,1,1\r\n`],
    ]),
  );
  cases.push(
    csv(
      "file with a NUL in a row (otherwise valid)",
      [
        ["kind", "modules"],
        ["intent", "import"],
      ],
      [
        {
          name: "file",
          filename: "modules.csv",
          type: "text/csv",
          bytes: Buffer.from(`${moduleHeader}\r\nNul\u0000Maker,HT-9,mono-PERC,36,100,18.6,5.38,22.4,5.75,-0.39,-0.29,0.05,noct,45,1000,670,7.5\r\n`),
        },
      ],
    ),
  );
  cases.push(
    csv("formula injection and Infinity", [
      ["kind", "modules"],
      ["intent", "import"],
      ["csvText", `${moduleHeader}\r\n=cmd|' /C calc'!A0,B,mono-PERC,36,Infinity,18,5,22,5.7,-0.4,-0.3,0.05,noct,45,1000,600,8\r\n`],
    ]),
  );
  cases.push(
    postForm(family, "curator", "/catalogue/import", "import sent as a urlencoded form", [
      ["kind", "modules"],
      ["intent", "import"],
    ]),
  );
  cases.push(
    get(
      family,
      "curator",
      `/catalogue?q=${encodeURIComponent(ODD_TEXT.nul)}&minW=NaN&maxW=-Infinity&sort=password&dir=sideways&limit=1e9&offset=-5`,
      "list with a NUL search and bad filters",
      { expect: "not5xx" },
    ),
  );
  cases.push(
    get(family, "curator", `/catalogue?kind=widgets&q=${encodeURIComponent(ODD_TEXT.sqlUnion)}`, "list of an unknown kind with SQL in the search", {
      expect: "not5xx",
    }),
  );
  return cases;
}
