// Invented module models for the demo catalogue (makers and figures made up for the Vell Valley
// scenario; no real product). Figures are at STC; coefficients in %/°C. OM-120FX is a light
// flexible module; the TOPCon and HJT models state NMOT rather than NOCT.
import type { CellTechnology, NominalTempKind } from "../../app/domain/catalogue/part-kinds";

export interface DemoModule {
  maker: string;
  model: string;
  cellTechnology: CellTechnology;
  cellsInSeries: number;
  pmaxW: number;
  vmpV: number;
  impA: number;
  vocV: number;
  iscA: number;
  gammaPmaxPctPerC: number;
  betaVocPctPerC: number;
  alphaIscPctPerC: number;
  noctC: number;
  /** NOCT unless stated. */
  nominalTempKind?: NominalTempKind;
  lengthMm: number;
  widthMm: number;
  massKg: number;
}

export const DEMO_MODULES: DemoModule[] = [
  { maker: "Harrowgate Cells", model: "HG-100M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 100, vmpV: 18.6, impA: 5.38, vocV: 22.4, iscA: 5.75, gammaPmaxPctPerC: -0.39, betaVocPctPerC: -0.29, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1010, widthMm: 665, massKg: 6.9 },
  { maker: "Harrowgate Cells", model: "HG-200M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 200, vmpV: 19.2, impA: 10.42, vocV: 23.1, iscA: 11.05, gammaPmaxPctPerC: -0.38, betaVocPctPerC: -0.29, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1480, widthMm: 680, massKg: 11.8 },
  { maker: "Harrowgate Cells", model: "HG-415T108", cellTechnology: "mono-TOPCon", cellsInSeries: 54, pmaxW: 415, vmpV: 31.6, impA: 13.13, vocV: 38.3, iscA: 13.92, gammaPmaxPctPerC: -0.30, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 43, lengthMm: 1722, widthMm: 1134, massKg: 21.3 },
  { maker: "Quillon Photonics", model: "QP-60P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 60, vmpV: 17.8, impA: 3.37, vocV: 21.6, iscA: 3.64, gammaPmaxPctPerC: -0.45, betaVocPctPerC: -0.34, alphaIscPctPerC: 0.06, noctC: 47, lengthMm: 770, widthMm: 540, massKg: 5.1 },
  { maker: "Quillon Photonics", model: "QP-150P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 150, vmpV: 18.0, impA: 8.33, vocV: 21.9, iscA: 8.93, gammaPmaxPctPerC: -0.44, betaVocPctPerC: -0.33, alphaIscPctPerC: 0.06, noctC: 47, lengthMm: 1480, widthMm: 670, massKg: 11.5 },
  { maker: "Quillon Photonics", model: "QP-330P60", cellTechnology: "poly", cellsInSeries: 60, pmaxW: 330, vmpV: 31.0, impA: 10.65, vocV: 37.8, iscA: 11.2, gammaPmaxPctPerC: -0.42, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 1960, widthMm: 992, massKg: 22.4 },
  { maker: "Fellmark Solar", model: "FM-380H", cellTechnology: "mono-HJT", cellsInSeries: 60, pmaxW: 380, vmpV: 35.2, impA: 10.8, vocV: 42.9, iscA: 11.4, gammaPmaxPctPerC: -0.26, betaVocPctPerC: -0.24, alphaIscPctPerC: 0.04, noctC: 43, lengthMm: 1755, widthMm: 1038, massKg: 19.5 },
  { maker: "Fellmark Solar", model: "FM-120M", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 120, vmpV: 18.4, impA: 6.52, vocV: 22.2, iscA: 6.95, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1070, widthMm: 705, massKg: 8.0 },
  { maker: "Cinderbrook", model: "CB-90F", cellTechnology: "thin-film CdTe", cellsInSeries: 100, pmaxW: 90, vmpV: 48.5, impA: 1.86, vocV: 61.0, iscA: 2.02, gammaPmaxPctPerC: -0.29, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.04, noctC: 45, lengthMm: 1200, widthMm: 600, massKg: 12.0 },
  { maker: "Harrowgate Cells", model: "HG-10M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 10, vmpV: 18.7, impA: 0.53, vocV: 22.5, iscA: 0.56, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 270, widthMm: 180, massKg: 0.6 },
  { maker: "Harrowgate Cells", model: "HG-30M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 30, vmpV: 18.7, impA: 1.6, vocV: 22.5, iscA: 1.7, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 470, widthMm: 310, massKg: 1.7 },
  { maker: "Harrowgate Cells", model: "HG-50M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 50, vmpV: 18.7, impA: 2.67, vocV: 22.5, iscA: 2.84, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 605, widthMm: 405, massKg: 2.8 },
  { maker: "Harrowgate Cells", model: "HG-160M36", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 160, vmpV: 18.7, impA: 8.56, vocV: 22.5, iscA: 9.12, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1150, widthMm: 680, massKg: 9 },
  { maker: "Harrowgate Cells", model: "HG-450T144", cellTechnology: "mono-TOPCon", cellsInSeries: 72, pmaxW: 450, vmpV: 42.1, impA: 10.69, vocV: 51.1, iscA: 11.33, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 1855, widthMm: 1095, massKg: 22.3, nominalTempKind: "nmot" },
  { maker: "Quillon Photonics", model: "QP-20P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 20, vmpV: 18, impA: 1.11, vocV: 22, iscA: 1.19, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 425, widthMm: 285, massKg: 1.4 },
  { maker: "Quillon Photonics", model: "QP-100P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 100, vmpV: 18, impA: 5.56, vocV: 22, iscA: 5.95, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 955, widthMm: 635, massKg: 7 },
  { maker: "Quillon Photonics", model: "QP-270P60", cellTechnology: "poly", cellsInSeries: 60, pmaxW: 270, vmpV: 30, impA: 9, vocV: 36.6, iscA: 9.63, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 1670, widthMm: 980, massKg: 18.8 },
  { maker: "Fellmark Solar", model: "FM-180M", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 180, vmpV: 18.7, impA: 9.63, vocV: 22.5, iscA: 10.26, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1220, widthMm: 720, massKg: 10.1 },
  { maker: "Fellmark Solar", model: "FM-420H", cellTechnology: "mono-HJT", cellsInSeries: 60, pmaxW: 420, vmpV: 35.4, impA: 11.86, vocV: 43.2, iscA: 12.51, gammaPmaxPctPerC: -0.26, betaVocPctPerC: -0.24, alphaIscPctPerC: 0.04, noctC: 41, lengthMm: 1780, widthMm: 1050, massKg: 22.4, nominalTempKind: "nmot" },
  { maker: "Fellmark Solar", model: "FM-440H", cellTechnology: "mono-HJT", cellsInSeries: 60, pmaxW: 440, vmpV: 35.4, impA: 12.43, vocV: 43.2, iscA: 13.11, gammaPmaxPctPerC: -0.26, betaVocPctPerC: -0.24, alphaIscPctPerC: 0.04, noctC: 41, lengthMm: 1825, widthMm: 1070, massKg: 23.5, nominalTempKind: "nmot" },
  { maker: "Cinderbrook", model: "CB-110F", cellTechnology: "thin-film CdTe", cellsInSeries: 100, pmaxW: 110, vmpV: 68, impA: 1.62, vocV: 86, iscA: 1.75, gammaPmaxPctPerC: -0.29, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.04, noctC: 45, lengthMm: 970, widthMm: 650, massKg: 10.1 },
  { maker: "Cinderbrook", model: "CB-120CI", cellTechnology: "thin-film CIGS", cellsInSeries: 66, pmaxW: 120, vmpV: 34.3, impA: 3.5, vocV: 43.6, iscA: 3.85, gammaPmaxPctPerC: -0.36, betaVocPctPerC: -0.3, alphaIscPctPerC: 0.01, noctC: 47, lengthMm: 1095, widthMm: 730, massKg: 12 },
  { maker: "Ottermere Cells", model: "OM-80M", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 80, vmpV: 18.7, impA: 4.28, vocV: 22.5, iscA: 4.56, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 765, widthMm: 510, massKg: 4.5 },
  { maker: "Ottermere Cells", model: "OM-120FX", cellTechnology: "mono-PERC", cellsInSeries: 36, pmaxW: 120, vmpV: 18.7, impA: 6.42, vocV: 22.5, iscA: 6.84, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 935, widthMm: 625, massKg: 1.3 },
  { maker: "Ottermere Cells", model: "OM-200T", cellTechnology: "mono-TOPCon", cellsInSeries: 32, pmaxW: 200, vmpV: 18.7, impA: 10.7, vocV: 22.7, iscA: 11.34, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 1240, widthMm: 725, massKg: 9.9, nominalTempKind: "nmot" },
  { maker: "Ottermere Cells", model: "OM-380T", cellTechnology: "mono-TOPCon", cellsInSeries: 54, pmaxW: 380, vmpV: 31.6, impA: 12.03, vocV: 38.3, iscA: 12.75, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 1705, widthMm: 1005, massKg: 18.8, nominalTempKind: "nmot" },
  { maker: "Brackenholt Solar", model: "BH-55A", cellTechnology: "thin-film a-Si", cellsInSeries: 60, pmaxW: 55, vmpV: 43.2, impA: 1.27, vocV: 57, iscA: 1.59, gammaPmaxPctPerC: -0.2, betaVocPctPerC: -0.3, alphaIscPctPerC: 0.08, noctC: 46, lengthMm: 1125, widthMm: 750, massKg: 11 },
  { maker: "Brackenholt Solar", model: "BH-150P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 150, vmpV: 18, impA: 8.33, vocV: 22, iscA: 8.91, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 1245, widthMm: 730, massKg: 10.5 },
  { maker: "Brackenholt Solar", model: "BH-300M60", cellTechnology: "mono-PERC", cellsInSeries: 60, pmaxW: 300, vmpV: 31.2, impA: 9.62, vocV: 37.5, iscA: 10.25, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1575, widthMm: 930, massKg: 16.8 },
  { maker: "Brackenholt Solar", model: "BH-360M72", cellTechnology: "mono-PERC", cellsInSeries: 72, pmaxW: 360, vmpV: 37.4, impA: 9.63, vocV: 45, iscA: 10.26, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1730, widthMm: 1015, massKg: 20.2 },
  { maker: "Greyfallow Photonics", model: "GF-100T", cellTechnology: "mono-TOPCon", cellsInSeries: 32, pmaxW: 100, vmpV: 18.7, impA: 5.35, vocV: 22.7, iscA: 5.67, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 820, widthMm: 550, massKg: 5, nominalTempKind: "nmot" },
  { maker: "Greyfallow Photonics", model: "GF-175T", cellTechnology: "mono-TOPCon", cellsInSeries: 32, pmaxW: 175, vmpV: 18.7, impA: 9.36, vocV: 22.7, iscA: 9.92, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 1160, widthMm: 680, massKg: 8.7, nominalTempKind: "nmot" },
  { maker: "Greyfallow Photonics", model: "GF-500T", cellTechnology: "mono-TOPCon", cellsInSeries: 66, pmaxW: 500, vmpV: 38.6, impA: 12.95, vocV: 46.9, iscA: 13.73, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 1955, widthMm: 1150, massKg: 24.8, nominalTempKind: "nmot" },
  { maker: "Greyfallow Photonics", model: "GF-550T", cellTechnology: "mono-TOPCon", cellsInSeries: 72, pmaxW: 550, vmpV: 42.1, impA: 13.06, vocV: 51.1, iscA: 13.84, gammaPmaxPctPerC: -0.3, betaVocPctPerC: -0.25, alphaIscPctPerC: 0.046, noctC: 41, lengthMm: 2050, widthMm: 1210, massKg: 27.3, nominalTempKind: "nmot" },
  { maker: "Tarnwick Energy", model: "TW-130H", cellTechnology: "mono-HJT", cellsInSeries: 32, pmaxW: 130, vmpV: 18.9, impA: 6.88, vocV: 23, iscA: 7.26, gammaPmaxPctPerC: -0.26, betaVocPctPerC: -0.24, alphaIscPctPerC: 0.04, noctC: 41, lengthMm: 930, widthMm: 620, massKg: 6.9, nominalTempKind: "nmot" },
  { maker: "Tarnwick Energy", model: "TW-250M", cellTechnology: "mono-PERC", cellsInSeries: 48, pmaxW: 250, vmpV: 25, impA: 10, vocV: 30, iscA: 10.65, gammaPmaxPctPerC: -0.37, betaVocPctPerC: -0.28, alphaIscPctPerC: 0.05, noctC: 45, lengthMm: 1440, widthMm: 845, massKg: 14 },
  { maker: "Tarnwick Energy", model: "TW-400H", cellTechnology: "mono-HJT", cellsInSeries: 54, pmaxW: 400, vmpV: 31.9, impA: 12.54, vocV: 38.9, iscA: 13.23, gammaPmaxPctPerC: -0.26, betaVocPctPerC: -0.24, alphaIscPctPerC: 0.04, noctC: 41, lengthMm: 1740, widthMm: 1020, massKg: 21.3, nominalTempKind: "nmot" },
  { maker: "Lowmoor PV", model: "LM-40P", cellTechnology: "poly", cellsInSeries: 36, pmaxW: 40, vmpV: 18, impA: 2.22, vocV: 22, iscA: 2.38, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 605, widthMm: 400, massKg: 2.8 },
  { maker: "Lowmoor PV", model: "LM-90CI", cellTechnology: "thin-film CIGS", cellsInSeries: 54, pmaxW: 90, vmpV: 28.1, impA: 3.2, vocV: 35.6, iscA: 3.52, gammaPmaxPctPerC: -0.36, betaVocPctPerC: -0.3, alphaIscPctPerC: 0.01, noctC: 47, lengthMm: 950, widthMm: 630, massKg: 9 },
  { maker: "Lowmoor PV", model: "LM-235P", cellTechnology: "poly", cellsInSeries: 60, pmaxW: 235, vmpV: 30, impA: 7.83, vocV: 36.6, iscA: 8.38, gammaPmaxPctPerC: -0.43, betaVocPctPerC: -0.32, alphaIscPctPerC: 0.06, noctC: 46, lengthMm: 1555, widthMm: 915, massKg: 16.4 },
];
