import { describe, expect, it } from "vitest";
import { airTemperatureAtSolarHourC, sunriseSolarHour } from "~/domain/solar/air-temperature";
import { declinationCooperDeg, averageDayOfMonth, extraterrestrialDailyKWhM2, sunsetHourAngleDeg } from "~/domain/solar/day-geometry";
import { erbsMonthlyDiffuseFraction } from "~/domain/solar/diffuse-fraction";
import { collaresPereiraRablTotalRatio, liuJordanDiffuseRatio } from "~/domain/solar/hourly-split";
import { cosIncidenceFromSunPosition } from "~/domain/solar/incidence-angle";
import { DAYS_IN_MONTH } from "~/domain/solar/module-yield";
import { modulePowerW } from "~/domain/solar/module-power";
import { estimateMonthlyYield, moduleYieldFromProfile, prepareSiteProfile, rankModulesForSite } from "~/domain/solar/monthly-yield";
import { noctCellTemperatureC } from "~/domain/solar/cell-temperature";
import { MADISON_HT_MJ, MPPT_12V, PWM_12V, TEST_LOSSES, TEST_MODULE, madisonSite } from "./yield-fixtures";

const RAD = Math.PI / 180;

describe("estimateMonthlyYield", () => {
  const result = estimateMonthlyYield({ site: madisonSite(), module: TEST_MODULE, controller: MPPT_12V, lossesPct: TEST_LOSSES });

  it("returns twelve months, an annual total, the worst month and plain-words assumptions", () => {
    expect(result.months.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    for (const m of result.months) {
      for (const key of ["h0KWhM2Day", "ghiKWhM2Day", "diffuseFraction", "poaKWhM2Day", "cellTempDaytimeC", "energyWhPerDay", "dcEnergyWhPerDay"] as const) {
        expect(Number.isFinite(m[key]), `${key} of month ${m.month}`).toBe(true);
      }
      expect(m.energyWhPerDay).toBeGreaterThan(0);
      expect(m.energyWhPerDay).toBeLessThan(m.dcEnergyWhPerDay);
    }
    const annual = result.months.reduce((sum, m) => sum + (m.energyWhPerDay * DAYS_IN_MONTH[m.month - 1]) / 1000, 0);
    expect(result.annualKWh).toBeCloseTo(annual, 9);
    const lowest = Math.min(...result.months.map((m) => m.energyWhPerDay));
    expect(result.months[result.worstMonth - 1].energyWhPerDay).toBe(lowest);
    expect(result.worstMonth).toBe(11); // November: least sun on the 60° plane in D&B Example 2.19.1
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
    expect(result.assumptions.length).toBeGreaterThan(4);
  });

  it("puts the Duffie & Beckman Example 2.19.1 irradiation on the array plane within 5 %", () => {
    // D&B Example 2.19.1 (REFERENCES.md: hourly integration within ~5 %).
    result.months.forEach((m, i) => {
      expect(Math.abs((m.poaKWhM2Day * 3.6) / MADISON_HT_MJ[i] - 1), `month ${m.month}`).toBeLessThanOrEqual(0.05);
    });
  });

  it("itemizes controller and losses so they add up to the delivered energy", () => {
    for (const m of result.months) {
      expect(m.controllerLossPct).toBeCloseTo(3, 9); // MPPT at 97 %
      const harvestWh = m.dcEnergyWhPerDay * 0.97;
      const lostWh = m.lossesWhPerDay.soiling + m.lossesWhPerDay.mismatch + m.lossesWhPerDay.wiring;
      expect(m.energyWhPerDay + lostWh).toBeCloseTo(harvestWh, 9);
      expect(m.energyWhPerDay).toBeCloseTo(harvestWh * 0.98 * 0.98 * 0.99, 9);
      expect(m.lossesWhPerDay.soiling).toBeCloseTo(harvestWh * 0.02, 9);
    }
  });

  it("cold months gain from temperature, hot months lose", () => {
    // Common practice, no source: output rises as cell temperature falls.
    expect(result.months[0].temperatureLossPct).toBeLessThan(0);
    expect(result.months[0].cellTempDaytimeC).toBeLessThan(25);
    expect(result.months[6].temperatureLossPct).toBeGreaterThan(0);
    expect(result.months[0].dcEnergyWhPerDay).toBeGreaterThan(TEST_MODULE.pmaxW * result.months[0].poaKWhM2Day);
  });

  it("agrees with a plain one-minute re-computation of one month from the published formulas", () => {
    // Independent loop: r_t and r_d used as published (not normalised), Erbs diffuse fraction,
    // cos θ/cos θz from the sun's zenith and azimuth, isotropic sky, NOCT, linear power. The
    // engine normalises r_t to sum to 1 (which shifts a day by up to ~0.5 %), so allow 1.5 %.
    for (const month of [1, 7]) {
      const site = madisonSite();
      const climate = site.months[month - 1];
      const n = averageDayOfMonth(month);
      const deltaDeg = declinationCooperDeg(n);
      const omegaSDeg = sunsetHourAngleDeg(43, deltaDeg);
      const hKWh = climate.ghiKWhM2Day!;
      const fd = erbsMonthlyDiffuseFraction(hKWh / extraterrestrialDailyKWhM2(43, n), omegaSDeg);
      let energyWh = 0;
      for (let minute = 0.5; minute < 1440; minute += 1) {
        const omegaDeg = (minute / 60 - 12) * 15;
        if (Math.abs(omegaDeg) >= omegaSDeg) continue;
        const total = collaresPereiraRablTotalRatio(omegaDeg, omegaSDeg) * hKWh * 1000; // W/m²
        const diffuse = Math.min(total, liuJordanDiffuseRatio(omegaDeg, omegaSDeg) * fd * hKWh * 1000);
        const cosZ = Math.cos(43 * RAD) * Math.cos(deltaDeg * RAD) * Math.cos(omegaDeg * RAD) + Math.sin(43 * RAD) * Math.sin(deltaDeg * RAD);
        const zenithDeg = Math.acos(cosZ) / RAD;
        const sinAz = (Math.cos(deltaDeg * RAD) * Math.sin(omegaDeg * RAD)) / Math.sin(zenithDeg * RAD);
        const cosAz = (cosZ * Math.sin(43 * RAD) - Math.sin(deltaDeg * RAD)) / (Math.sin(zenithDeg * RAD) * Math.cos(43 * RAD));
        const sunAzimuthDeg = 180 + Math.atan2(sinAz, cosAz) / RAD; // D&B γs from south → compass
        const cosTheta = Math.max(0, cosIncidenceFromSunPosition(zenithDeg, sunAzimuthDeg, 60, 180));
        const poa = ((total - diffuse) * cosTheta) / cosZ + (diffuse * (1 + Math.cos(60 * RAD))) / 2 + (total * climate.albedo! * (1 - Math.cos(60 * RAD))) / 2;
        const airC = airTemperatureAtSolarHourC(minute / 60, sunriseSolarHour(omegaSDeg), climate.tMinC, climate.tMaxC);
        energyWh += modulePowerW(100, poa, noctCellTemperatureC(airC, poa, 45), -0.004) / 60;
      }
      const engineWh = result.months[month - 1].dcEnergyWhPerDay;
      expect(Math.abs(engineWh / energyWh - 1), `month ${month}: ${engineWh.toFixed(1)} vs ${energyWh.toFixed(1)} Wh`).toBeLessThan(0.015);
    }
  });

  it("lists the clearness-index assumption only for the months that used it", () => {
    const site = madisonSite();
    site.months[0] = { clearnessIndex: 0.45, tMaxC: -4, tMinC: -13, albedo: 0.7 };
    site.months[11] = { clearnessIndex: 0.4, tMaxC: -2, tMinC: -10 };
    const assumed = estimateMonthlyYield({ site, module: TEST_MODULE, controller: MPPT_12V, lossesPct: TEST_LOSSES });
    const text = assumed.assumptions.find((a) => a.includes("clearness index"));
    expect(text).toMatch(/Jan, Dec/);
    expect(text).toMatch(/Jan 0\.45/);
    expect(assumed.months[0].irradianceSource).toBe("clearness-index");
    expect(assumed.months[0].ghiKWhM2Day).toBeCloseTo(0.45 * assumed.months[0].h0KWhM2Day, 9);
    expect(assumed.months[11].albedo).toBe(0.2); // site albedo when the month gives none
    expect(result.assumptions.some((a) => a.includes("assumed clearness index"))).toBe(false);
  });

  it("describes the PWM operating voltage, the cell-temperature model and the losses", () => {
    const pwm = estimateMonthlyYield({
      site: madisonSite(),
      module: TEST_MODULE,
      controller: PWM_12V,
      lossesPct: TEST_LOSSES,
      options: { cellTempModel: "faiman", windSpeedMs: 4 },
    });
    const text = pwm.assumptions.join("\n");
    expect(text).toMatch(/PWM controller on a 12 V battery/);
    expect(text).toMatch(/14\.50 V per module/);
    expect(text).toMatch(/Faiman \(2008\).*wind 4\.0 m\/s/);
    expect(text).toMatch(/soiling 2\.0 %, mismatch 2\.0 %, wiring 1\.0 % \(together 4\.9 %\)/);
    expect(result.assumptions.join("\n")).toMatch(/NOCT model with NOCT 45\.0 °C/);
    // Faiman with 4 m/s of wind cools the cells below the NOCT model's estimate.
    expect(pwm.months[6].cellTempDaytimeC!).toBeLessThan(result.months[6].cellTempDaytimeC!);
  });

  it("mirrors to the southern hemisphere within 3 % a year", () => {
    // Common practice, no source: a north-facing array at 43°S with the months shifted by six.
    // Not exact (see tilted-irradiation.test.ts): average days and orbit eccentricity differ.
    const north = madisonSite();
    const south = { ...north, latitudeDeg: -43, azimuthDeg: 0, months: north.months.map((_, i) => north.months[(i + 6) % 12]) };
    const southResult = estimateMonthlyYield({ site: south, module: TEST_MODULE, controller: MPPT_12V, lossesPct: TEST_LOSSES });
    expect(Math.abs(southResult.annualKWh / result.annualKWh - 1)).toBeLessThan(0.03);
    expect(southResult.worstMonth).toBe(5); // November mirrored to May
  });

  it("copes with polar night", () => {
    const site = madisonSite();
    const arctic = { ...site, latitudeDeg: 78, months: site.months.map((m) => ({ clearnessIndex: 0.45, tMaxC: m.tMaxC - 10, tMinC: m.tMinC - 10 })) };
    const polar = estimateMonthlyYield({ site: arctic, module: TEST_MODULE, controller: PWM_12V, lossesPct: TEST_LOSSES });
    expect(polar.months[11].energyWhPerDay).toBe(0);
    expect(polar.months[11].cellTempDaytimeC).toBeNull();
    expect(polar.months[5].energyWhPerDay).toBeGreaterThan(0);
    expect([1, 11, 12]).toContain(polar.worstMonth);
    expect(polar.assumptions.join("\n")).toMatch(/Polar night in .*Dec/);
  });
});

describe("ranking many modules for one site", () => {
  const profile = prepareSiteProfile(madisonSite());
  const bigger = { ...TEST_MODULE, pmaxW: 150, impA: 8.25, iscA: 8.85 };
  const hotter = { ...TEST_MODULE, noctC: 55 };

  it("gives the same figures as the one-shot estimate", () => {
    const once = estimateMonthlyYield({ site: madisonSite(), module: TEST_MODULE, controller: PWM_12V, lossesPct: TEST_LOSSES });
    expect(moduleYieldFromProfile(profile, TEST_MODULE, PWM_12V, TEST_LOSSES)).toEqual(once);
  });

  it("orders modules best first and keeps their list index", () => {
    const ranking = rankModulesForSite(profile, [TEST_MODULE, bigger, hotter], MPPT_12V, TEST_LOSSES);
    expect(ranking.map((r) => r.index)).toEqual([1, 0, 2]);
    expect(ranking[0].worstMonthEnergyWhPerDay).toBeCloseTo(1.5 * ranking[1].worstMonthEnergyWhPerDay, 6);
    const byAnnual = rankModulesForSite(profile, [hotter, TEST_MODULE], MPPT_12V, TEST_LOSSES, "annual");
    expect(byAnnual.map((r) => r.index)).toEqual([1, 0]);
  });
});
