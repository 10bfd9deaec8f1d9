import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import type { CamResult } from "../api/cam-result-schema";
import { toShown, trimNumber, unitOf, type UnitSystem } from "../model/units";
import { chartRows, slipRanges } from "./curve-data";

const ticks = [0, 30, 60, 90, 120, 150, 180];
const colours = {
  lift: "var(--color-steel-800)",
  force: "var(--color-spark-600)",
  engage: "var(--color-spark-700)",
  zone: "var(--color-steel-300)",
  slip: "var(--color-fault-300)",
};

/**
 * Lift and clamping force over the cam's half turn, with the engagement point marked, the working zone
 * shaded and the stretches where it would not lock shaded red. A table of the same figures follows for
 * anyone who cannot read the chart.
 */
export function CamChart({
  result,
  system,
  gapMm,
}: {
  result: CamResult;
  system: UnitSystem;
  gapMm: number;
}) {
  const rows = chartRows(result, system);
  const lengthUnit = unitOf(system, "length");
  const forceUnit = unitOf(system, "force");
  const engage = result.engageAngleDeg;
  return (
    <figure className="rounded-lg border border-steel-200 bg-white p-4">
      <figcaption className="font-semibold text-steel-950">Lift and clamping force over the turn</figcaption>
      <ul className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-steel-700" aria-hidden="true">
        <li className="flex items-center gap-2">
          <span className="h-0.5 w-6 bg-steel-800" />
          lift ({lengthUnit.symbol}, left)
        </li>
        <li className="flex items-center gap-2">
          <span className="h-0.5 w-6 bg-spark-600" />
          clamping force ({forceUnit.symbol}, right)
        </li>
        <li className="flex items-center gap-2">
          <span className="h-3 w-5 bg-steel-300/60" />
          working zone
        </li>
        <li className="flex items-center gap-2">
          <span className="h-3 w-5 bg-fault-300/60" />
          would not lock here
        </li>
      </ul>
      <div
        className="mt-2 h-72 w-full"
        role="img"
        aria-label={`Chart: lift rises from 0 to ${trimNumber(toShown(system, "length", result.throwMm), lengthUnit.decimals)} ${lengthUnit.symbol} over 180°; the cam engages at ${trimNumber(engage, 1)}°.`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={{ top: 20, right: 8, bottom: 16, left: 0 }}>
            <CartesianGrid stroke="var(--color-steel-200)" strokeDasharray="3 3" />
            <XAxis
              dataKey="angleDeg"
              type="number"
              domain={[0, 180]}
              ticks={ticks}
              tickFormatter={(v: number) => `${v}°`}
              label={{
                value: "rotation from the lowest point",
                position: "insideBottom",
                offset: -10,
                fontSize: 12,
              }}
              tick={{ fontSize: 12 }}
            />
            <YAxis
              yAxisId="lift"
              tick={{ fontSize: 12 }}
              width={52}
              tickFormatter={(v: number) => trimNumber(v, system === "inch" ? 3 : 1)}
            />
            <YAxis
              yAxisId="force"
              orientation="right"
              tick={{ fontSize: 12 }}
              width={56}
              tickFormatter={(v: number) => trimNumber(v, 0)}
            />
            <ReferenceArea
              yAxisId="lift"
              x1={result.workingZone.startDeg}
              x2={result.workingZone.endDeg}
              fill={colours.zone}
              fillOpacity={0.25}
            />
            {slipRanges(result).map(([a, b]) => (
              <ReferenceArea key={a} yAxisId="lift" x1={a} x2={b} fill={colours.slip} fillOpacity={0.4} />
            ))}
            <ReferenceLine
              yAxisId="lift"
              x={engage}
              stroke={colours.engage}
              strokeWidth={2}
              label={{
                value: `engages ${trimNumber(engage, 1)}°`,
                position: "top",
                fill: colours.engage,
                fontSize: 12,
                fontWeight: 600,
              }}
            />
            <ReferenceDot
              yAxisId="lift"
              x={engage}
              y={toShown(system, "length", gapMm)}
              r={5}
              fill={colours.engage}
              stroke="white"
            />
            <Line
              yAxisId="lift"
              dataKey="lift"
              name="lift"
              stroke={colours.lift}
              strokeWidth={2.5}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              yAxisId="force"
              dataKey="force"
              name="clamping force"
              stroke={colours.force}
              strokeWidth={2.5}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              yAxisId="force"
              dataKey="forceBefore"
              name="force if it met the work here"
              stroke={colours.force}
              strokeDasharray="4 4"
              strokeOpacity={0.6}
              dot={false}
              isAnimationActive={false}
            />
            <Tooltip
              formatter={(value, name) => {
                const v = typeof value === "number" ? value : Number(value);
                return name === "lift"
                  ? [`${trimNumber(v, lengthUnit.decimals)} ${lengthUnit.symbol}`, name]
                  : [`${trimNumber(v, 0)} ${forceUnit.symbol}`, String(name)];
              }}
              labelFormatter={(label) => `${String(label)}° from the lowest point`}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-1 text-sm text-steel-600">
        The dashed force line is what the cam would press with if it met the work earlier in its turn (a
        thicker workpiece or a smaller gap).
      </p>
      <details className="mt-3">
        <summary className="cursor-pointer font-semibold text-steel-800">Show the figures as a table</summary>
        <div className="mt-2 max-h-72 overflow-auto">
          <table className="figure w-full text-right text-sm">
            <thead className="sticky top-0 bg-steel-100 text-steel-700">
              <tr>
                <th scope="col" className="px-2 py-1">
                  rotation
                </th>
                <th scope="col" className="px-2 py-1">
                  lift ({lengthUnit.symbol})
                </th>
                <th scope="col" className="px-2 py-1">
                  rise angle
                </th>
                <th scope="col" className="px-2 py-1">
                  force ({forceUnit.symbol})
                </th>
                <th scope="col" className="px-2 py-1">
                  locks
                </th>
              </tr>
            </thead>
            <tbody>
              {result.curve.map((p) => (
                <tr key={p.angleDeg} className={p.engaged ? "" : "text-steel-500"}>
                  <td className="px-2 py-0.5">{p.angleDeg}°</td>
                  <td className="px-2 py-0.5">
                    {trimNumber(toShown(system, "length", p.liftMm), lengthUnit.decimals)}
                  </td>
                  <td className="px-2 py-0.5">{trimNumber(p.riseAngleDeg, 2)}°</td>
                  <td className="px-2 py-0.5">
                    {p.clampForceN === null ? "—" : trimNumber(toShown(system, "force", p.clampForceN), 0)}
                  </td>
                  <td className="px-2 py-0.5">{p.selfLocking ? "yes" : "no"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </figure>
  );
}
