import { convertLength, formatNumber, type LengthUnit } from "@/engine/units";
import type { PartSummaryView } from "../api/evaluate";

const len = (mm: number, units: LengthUnit) =>
  formatNumber(convertLength(mm, "mm", units), units === "in" ? 3 : 1);

const formWords: Record<string, string> = {
  round: "Round bar",
  flat: "Flat bar",
  plate: "Plate",
  hex: "Hex bar",
};

/** "Round bar Ø16 × 42 mm", "Flat bar 40 × 12 × 60 mm". */
export function stockText(stock: PartSummaryView["stock"], units: LengthUnit): string {
  const form = formWords[stock.form] ?? stock.form;
  if (stock.diameterMm !== undefined) {
    const across =
      stock.form === "hex" ? `${len(stock.diameterMm, units)} A/F` : `Ø${len(stock.diameterMm, units)}`;
    return `${form} ${across} × ${len(stock.lengthMm, units)} ${units}`;
  }
  return `${form} ${len(stock.widthMm ?? 0, units)} × ${len(stock.thicknessMm ?? 0, units)} × ${len(stock.lengthMm, units)} ${units}`;
}

function massText(kg: number | null): string {
  if (kg === null || !Number.isFinite(kg)) return "—";
  return kg < 1 ? `${formatNumber(kg * 1000, 0)} g` : `${formatNumber(kg, 2)} kg`;
}

/** The parts with their materials, the stock each is cut from and their finished weights. */
export function PartsList({ parts, units }: { parts: readonly PartSummaryView[]; units: LengthUnit }) {
  if (parts.length === 0) return null;
  const total = parts.reduce((sum, p) => sum + (p.massKg ?? 0) * p.quantity, 0);
  return (
    <section
      aria-labelledby="parts-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="parts-heading" className="text-xl">
        Parts
      </h2>
      <div className="mt-3 overflow-x-auto">
        <table className="w-full min-w-[36rem] text-left text-sm">
          <caption className="sr-only">
            Parts with quantity, material, finished size, stock and weight
          </caption>
          <thead className="border-b-2 border-steel-300 text-steel-700">
            <tr>
              <th scope="col" className="py-1.5 pr-3 font-semibold">
                Part
              </th>
              <th scope="col" className="py-1.5 pr-3 text-right font-semibold">
                Qty
              </th>
              <th scope="col" className="py-1.5 pr-3 font-semibold">
                Material
              </th>
              <th scope="col" className="py-1.5 pr-3 font-semibold">
                Finished size ({units})
              </th>
              <th scope="col" className="py-1.5 pr-3 font-semibold">
                Cut from
              </th>
              <th scope="col" className="py-1.5 text-right font-semibold">
                Weight each
              </th>
            </tr>
          </thead>
          <tbody>
            {parts.map((p) => (
              <tr key={p.id} className="border-b border-steel-200 align-top">
                <th scope="row" className="py-1.5 pr-3 font-semibold text-steel-950">
                  {p.name}
                  {!p.buildable ? (
                    <span className="block text-xs font-semibold text-fault-700">
                      cannot be built with these values
                    </span>
                  ) : null}
                  {p.heatTreatment ? (
                    <span className="block text-xs font-normal text-steel-600">{p.heatTreatment}</span>
                  ) : null}
                </th>
                <td className="figure py-1.5 pr-3 text-right">{p.quantity}</td>
                <td className="py-1.5 pr-3">{p.materialName ?? p.material}</td>
                <td className="figure whitespace-nowrap py-1.5 pr-3">
                  {len(p.bboxMm.x, units)} × {len(p.bboxMm.y, units)} × {len(p.bboxMm.z, units)}
                </td>
                <td className="figure whitespace-nowrap py-1.5 pr-3">{stockText(p.stock, units)}</td>
                <td className="figure whitespace-nowrap py-1.5 text-right">{massText(p.massKg)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <td colSpan={5} className="pt-2 text-right font-semibold text-steel-800">
                Finished weight of the set
              </td>
              <td className="figure pt-2 text-right font-semibold">{massText(total)}</td>
            </tr>
          </tfoot>
        </table>
      </div>
      <p className="mt-2 text-sm text-steel-600">
        Stock is the smallest bar each part fits in, with its machining allowance; the cut list in the
        download pack rounds it up to a bar size you can buy.
      </p>
    </section>
  );
}
