// Nameplate checks: each rule fires at the field to correct, and a consistent datasheet passes.
import { describe, expect, it } from "vitest";
import { PMAX_PRODUCT_TOLERANCE, validateModuleNameplate } from "~/domain/catalogue/module-validation";
import type { ModuleNameplate } from "~/domain/catalogue/part-specs";

// An invented 36-cell 100 W module (demo data, not a real product): Vmp·Imp = 18.6 × 5.38 = 100.07 W.
const base: ModuleNameplate = {
  maker: "Harrowgate Cells",
  model: "HG-100M36",
  cellTechnology: "mono-PERC",
  cellsInSeries: 36,
  pmaxW: 100,
  vmpV: 18.6,
  impA: 5.38,
  vocV: 22.4,
  iscA: 5.75,
  gammaPmaxPctPerC: -0.39,
  betaVocPctPerC: -0.29,
  alphaIscPctPerC: 0.05,
  nominalTempKind: "noct",
  noctC: 45,
  lengthMm: 1010,
  widthMm: 665,
  massKg: 6.9,
};

function issues(change: Partial<ModuleNameplate>) {
  return validateModuleNameplate({ ...base, ...change });
}

describe("module nameplate validation", () => {
  it("accepts a consistent datasheet", () => {
    expect(validateModuleNameplate(base)).toEqual({});
  });

  it("puts Vmp ≥ Voc at the Vmp field (the maximum power point lies below open circuit)", () => {
    expect(issues({ vmpV: 22.4 }).vmpV).toMatch(/Vmp must be below Voc \(22\.4 V\)/);
    expect(issues({ vmpV: 23 }).vmpV).toMatch(/below Voc/);
  });

  it("puts Imp ≥ Isc at the Imp field", () => {
    expect(issues({ impA: 5.75, pmaxW: 107 }).impA).toMatch(/Imp must be below Isc \(5\.75 A\)/);
  });

  it("checks Pmax against Vmp × Imp within the stated tolerance", () => {
    // 18.6 × 5.38 = 100.068 W. Pmax 103 W deviates 2.85 % (passes); 104 W deviates 3.78 % (fails).
    // Tolerance: common practice, no source (rounded datasheet figures).
    expect(PMAX_PRODUCT_TOLERANCE).toBe(0.03);
    expect(issues({ pmaxW: 103 }).pmaxW).toBeUndefined();
    expect(issues({ pmaxW: 104 }).pmaxW).toMatch(/differs from Vmp × Imp = 100\.1 W by 3\.8 %/);
    expect(issues({ pmaxW: 90 }).pmaxW).toMatch(/by 11\.2 %/);
  });

  it("catches a cell count that gives an impossible voltage per silicon cell", () => {
    // 22.4 V over 72 cells is 0.31 V per cell; a crystalline silicon cell gives about 0.6–0.75 V (from memory).
    expect(issues({ cellsInSeries: 72 }).cellsInSeries).toMatch(/0\.31 V per cell/);
    // Thin film is not held to the silicon figure.
    expect(issues({ cellsInSeries: 72, cellTechnology: "thin-film CdTe" }).cellsInSeries).toBeUndefined();
  });

  it("catches dimensions typed in centimetres and implausible efficiency", () => {
    expect(issues({ lengthMm: 101, widthMm: 66.5 }).lengthMm).toMatch(/Length must be between 150 and 2700 mm/);
    // 100 W on 0.5 × 0.5 m = 0.25 m² → 40 % efficient (η = P / (1000 W/m² · A)); no module reaches that.
    expect(issues({ lengthMm: 500, widthMm: 500, massKg: 3 }).lengthMm).toMatch(/40 % efficient/);
  });

  it("catches a mass that does not fit the area", () => {
    // 1010 × 665 mm = 0.672 m²: 59 kg would be 87.8 kg/m² (a slip for 5.9); framed glass modules weigh ≈ 10–15 kg/m² (from memory).
    expect(issues({ massKg: 59 }).massKg).toMatch(/59 kg on this area is 87\.8 kg\/m²/);
  });

  it("names a flipped temperature coefficient sign in plain words", () => {
    expect(issues({ gammaPmaxPctPerC: 0.39 }).gammaPmaxPctPerC).toMatch(/negative.*minus sign/);
    expect(issues({ betaVocPctPerC: 0.29 }).betaVocPctPerC).toMatch(/negative/);
    expect(issues({ alphaIscPctPerC: -0.05 }).alphaIscPctPerC).toMatch(/positive/);
  });

  it("reports a fill factor no module reaches at the Isc field", () => {
    // Vmp/Voc = 0.98 and Imp/Isc = 0.99 give FF ≈ 0.97 (FF = Pmax / (Voc·Isc)); c-Si modules are ≈ 0.72–0.82 (from memory).
    const tight = issues({ vocV: 18.98, iscA: 5.44 });
    expect(tight.iscA).toMatch(/Fill factor .* 0\.97/);
  });

  it("keeps the first message of a field and skips cross-checks on a field already in error", () => {
    const r = issues({ vmpV: -1 });
    expect(r.vmpV).toMatch(/between 0\.5 and 300 V/);
    expect(r.pmaxW).toBeUndefined();
  });
});
