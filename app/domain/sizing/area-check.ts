// The array's footprint against the largest area the site allows (a roof, a yard), when the installer
// set one. Only the modules' own area counts (length × width from the catalogue); gaps between rows,
// walkways and edge setbacks are for the installer to leave inside the limit.
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt } from "./format";
import type { ModulePart } from "./parts";

export const ARRAY_AREA_CHECK_ID = "array.area";

/** The modules' total area, m². The check and the optimiser's pruning both use this, so they agree to the last bit. */
export function arrayAreaM2(moduleCount: number, moduleAreaM2: number): number {
  return moduleCount * moduleAreaM2;
}

/** The module's area when the catalogue gives one, m²; null otherwise. */
export function knownModuleAreaM2(module: ModulePart): number | null {
  const area = module.areaM2;
  return typeof area === "number" && Number.isFinite(area) && area > 0 ? area : null;
}

/** Null when the plan sets no area limit. */
export function arrayAreaCheck(module: ModulePart, moduleCount: number, maxArrayAreaM2: number | undefined): PlanCheck | null {
  if (maxArrayAreaM2 === undefined) return null;
  const title = "Array area";
  const basis = "Module area = length × width from the catalogue; the modules' own footprint, without gaps between rows.";
  const moduleAreaM2 = knownModuleAreaM2(module);
  if (moduleAreaM2 === null) {
    return {
      id: ARRAY_AREA_CHECK_ID,
      kind: "performance",
      status: "warn",
      title,
      sentence: `The module's area is not known, so the ${moduleCount} modules could not be checked against the ${fmt(maxArrayAreaM2, 2)} m² the site allows: measure them before buying.`,
      figures: [figure("Modules", moduleCount, ""), figure("Largest area the site allows", maxArrayAreaM2, "m²")],
      basis,
    };
  }
  const totalM2 = arrayAreaM2(moduleCount, moduleAreaM2);
  const over = totalM2 > maxArrayAreaM2;
  const cover = `${moduleCount} modules of ${fmt(moduleAreaM2, 3)} m² cover ${fmt(totalM2, 2)} m²`;
  return {
    id: ARRAY_AREA_CHECK_ID,
    kind: "performance",
    status: over ? "fail" : "pass",
    title,
    sentence: over
      ? `${cover}, more than the ${fmt(maxArrayAreaM2, 2)} m² the site allows. Choose a module with more watts per square metre, or find more room.`
      : `${cover}, within the ${fmt(maxArrayAreaM2, 2)} m² the site allows.`,
    figures: [
      figure("Modules", moduleCount, ""),
      figure("Module area", moduleAreaM2, "m²"),
      figure("Array area", totalM2, "m²"),
      figure("Largest area the site allows", maxArrayAreaM2, "m²"),
    ],
    basis,
  };
}
