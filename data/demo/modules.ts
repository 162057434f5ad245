// Invented module models for the demo catalogue (makers and figures made up for the Vell Valley
// scenario; no real product). Figures are at STC; coefficients in %/°C.
export interface DemoModule {
  maker: string;
  model: string;
  cellTechnology: "mono-PERC" | "mono-TOPCon" | "poly" | "mono-HJT" | "thin-film CdTe";
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
];
