// Shown on the reading form: measuring a module under load can hurt people and equipment.
export function SafetyCaution() {
  return (
    <aside role="note" aria-label="Measuring safely" className="rounded-xl border border-warn bg-warn-wash p-4 text-sm">
      <p className="mb-2 flex gap-2 font-semibold">
        <span aria-hidden="true">⚠</span> Measuring safely
      </p>
      <ul className="list-disc space-y-1 pl-5 text-ink">
        <li>Keep the electronic load inside its safe operating area (voltage, current and power together); a module in full sun can exceed it.</li>
        <li>The load turns the module's power into heat: it and its leads get hot. Give it air and never cover it.</li>
        <li>Sweep quickly — a second or two — so the sun and the module's temperature do not change during the sweep.</li>
        <li>
          DC arcs when a circuit is opened under load: reduce the load to zero or cover the module before you disconnect, and use connectors rated for DC.
        </li>
        <li>Work off ladders and roofs only with fall protection. Follow your local electrical rules; live work is for licensed people.</li>
      </ul>
    </aside>
  );
}
