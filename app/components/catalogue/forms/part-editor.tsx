// Picks the form for a part kind.
import type { PartFormProps } from "./use-part-form";
import { BatteryForm } from "./battery-form";
import { ControllerForm } from "./controller-form";
import { InverterForm } from "./inverter-form";
import { ModuleForm } from "./module-form";
import type { PartKind } from "~/domain/catalogue/part-kinds";

export function PartEditor({ kind, ...props }: PartFormProps & { kind: PartKind }) {
  switch (kind) {
    case "modules":
      return <ModuleForm {...props} />;
    case "batteries":
      return <BatteryForm {...props} />;
    case "controllers":
      return <ControllerForm {...props} />;
    case "inverters":
      return <InverterForm {...props} />;
  }
}
