// The bar above a print view: back, and print (the browser's own "Save as PDF" makes the PDF).
import { Link } from "react-router";

export function PrintBar({ backTo, backLabel }: { backTo: string; backLabel: string }) {
  return (
    <div className="no-print mb-4 flex flex-wrap items-center justify-between gap-2">
      <Link to={backTo} className="underline">
        ← {backLabel}
      </Link>
      <button type="button" onClick={() => window.print()} className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
        Print or save as PDF
      </button>
    </div>
  );
}
