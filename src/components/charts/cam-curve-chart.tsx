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

/** One row of an eccentric cam's curve (the `eccentric-cam` calculator gives one every 5°). */
export interface CamCurveRow {
  angleDeg: number;
  liftMm: number;
  clampForceN: number | null;
  selfLocking: boolean;
  engaged: boolean;
  /** Rise (wedge) angle at this point; when the rows carry it, the table shows a column for it. */
  riseAngleDeg?: number;
}

/** How a quantity is shown: its symbol, the factor from the calculator's unit (mm, N) and the decimals. */
export interface ShownUnit {
  symbol: string;
  perBase: number;
  decimals: number;
}

export interface CamCurveChartProps {
  curve: readonly CamCurveRow[];
  engageAngleDeg: number;
  throwMm: number;
  workingZone?: { startDeg: number; endDeg: number };
  length: ShownUnit;
  force: ShownUnit;
  /** Heading of the figure. */
  title?: string;
  /**
   * Also draw, dashed, the force the cam would press with had it met the work earlier in its turn (a
   * thicker workpiece or a smaller gap): for a learner trying what a different setting does.
   */
  showEarlierForce?: boolean;
}

/** Plain lines, drawn at once: the chart follows typing, and an animation would lag behind it. */
const plainLine = { dot: false, isAnimationActive: false } as const;

const trim = (value: number, decimals: number) => {
  const text = value.toFixed(decimals);
  return text.includes(".") ? text.replace(/\.?0+$/, "") : text;
};

/**
 * Lift and clamping force over the cam's half turn with the engagement point marked, the working zone
 * shaded and the stretches where the cam would not hold shaded red. A table of the same figures sits
 * under it for anyone who cannot read the chart. Shared so any page showing a cam analysis draws it alike.
 */
export function CamCurveChart({
  curve,
  engageAngleDeg,
  throwMm,
  workingZone,
  length,
  force,
  title = "Lift and clamping force over the turn",
  showEarlierForce = false,
}: CamCurveChartProps) {
  const rows = chartRows(curve, engageAngleDeg, force.perBase, length.perBase);
  const withRise = curve.some((p) => p.riseAngleDeg !== undefined);
  // Lift at engagement: e(1 − cos φ) with e = throw / 2 (a circular cam's lift from its lowest point).
  const engageLift = (throwMm / 2) * (1 - Math.cos((engageAngleDeg * Math.PI) / 180)) * length.perBase;
  const slips = slipRanges(curve);
  return (
    <figure className="rounded-lg border border-steel-200 bg-white p-4">
      <figcaption className="font-semibold text-steel-950">{title}</figcaption>
      <ul className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-steel-700" aria-hidden="true">
        <li className="flex items-center gap-2">
          <span className="h-0.5 w-6 bg-steel-800" />
          lift ({length.symbol}, left axis)
        </li>
        <li className="flex items-center gap-2">
          <span className="h-0.5 w-6 bg-spark-600" />
          clamping force ({force.symbol}, right axis)
        </li>
        {workingZone ? (
          <li className="flex items-center gap-2">
            <span className="h-3 w-5 bg-steel-300/60" />
            working zone
          </li>
        ) : null}
        {slips.length > 0 ? (
          <li className="flex items-center gap-2">
            <span className="h-3 w-5 bg-fault-300/60" />
            would not hold here
          </li>
        ) : null}
      </ul>
      <div
        className="mt-2 h-64 w-full"
        role="img"
        aria-label={`Chart: lift rises from 0 to ${trim(throwMm * length.perBase, length.decimals)} ${length.symbol} over half a turn; the cam meets the work at ${trim(engageAngleDeg, 1)}° from its lowest point.`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={{ top: 22, right: 6, bottom: 18, left: 0 }}>
            <CartesianGrid stroke="var(--color-steel-200)" strokeDasharray="3 3" />
            <XAxis
              dataKey="angleDeg"
              type="number"
              domain={[0, 180]}
              ticks={[0, 30, 60, 90, 120, 150, 180]}
              tickFormatter={(v: number) => `${v}°`}
              tick={{ fontSize: 12, fill: "var(--color-steel-700)" }}
              label={{
                value: "turn from the lowest point",
                position: "insideBottom",
                offset: -12,
                fontSize: 12,
                fill: "var(--color-steel-700)",
              }}
            />
            <YAxis
              yAxisId="lift"
              width={50}
              tick={{ fontSize: 12, fill: "var(--color-steel-700)" }}
              tickFormatter={(v: number) => trim(v, length.decimals > 2 ? 3 : 1)}
            />
            <YAxis
              yAxisId="force"
              orientation="right"
              width={54}
              tick={{ fontSize: 12, fill: "var(--color-steel-700)" }}
              tickFormatter={(v: number) => trim(v, 0)}
            />
            {workingZone ? (
              <ReferenceArea
                yAxisId="lift"
                x1={workingZone.startDeg}
                x2={workingZone.endDeg}
                fill="var(--color-steel-300)"
                fillOpacity={0.25}
              />
            ) : null}
            {slips.map(([a, b]) => (
              <ReferenceArea
                key={a}
                yAxisId="lift"
                x1={a}
                x2={b}
                fill="var(--color-fault-300)"
                fillOpacity={0.4}
              />
            ))}
            <ReferenceLine
              yAxisId="lift"
              x={engageAngleDeg}
              stroke="var(--color-spark-700)"
              strokeWidth={2}
              label={{
                value: `meets the work ${trim(engageAngleDeg, 1)}°`,
                position: "top",
                fill: "var(--color-spark-700)",
                fontSize: 12,
                fontWeight: 600,
              }}
            />
            <ReferenceDot
              yAxisId="lift"
              x={engageAngleDeg}
              y={engageLift}
              r={5}
              fill="var(--color-spark-700)"
              stroke="white"
            />
            <Line
              yAxisId="lift"
              dataKey="lift"
              name="lift"
              stroke="var(--color-steel-800)"
              strokeWidth={2.5}
              {...plainLine}
            />
            <Line
              yAxisId="force"
              dataKey="force"
              name="clamping force"
              stroke="var(--color-spark-600)"
              strokeWidth={2.5}
              {...plainLine}
              connectNulls={false}
            />
            {showEarlierForce ? (
              <Line
                yAxisId="force"
                dataKey="earlierForce"
                name="force if it met the work here"
                stroke="var(--color-spark-600)"
                strokeDasharray="4 4"
                strokeOpacity={0.6}
                {...plainLine}
              />
            ) : null}
            <Tooltip
              formatter={(value, name) => {
                const v = typeof value === "number" ? value : Number(value);
                return name === "lift"
                  ? [`${trim(v, length.decimals)} ${length.symbol}`, "lift"]
                  : [`${trim(v, force.decimals)} ${force.symbol}`, String(name)];
              }}
              labelFormatter={(label) => `${String(label)}° from the lowest point`}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      {showEarlierForce ? (
        <p className="mt-1 text-sm text-steel-600">
          The dashed force line is what the cam would press with if it met the work earlier in its turn (a
          thicker workpiece or a smaller gap).
        </p>
      ) : null}
      <details className="mt-2">
        <summary className="cursor-pointer rounded font-semibold text-steel-800">
          Show the figures as a table
        </summary>
        <div className="mt-2 max-h-64 overflow-auto">
          <table className="figure w-full text-right text-sm">
            <caption className="sr-only">{title}</caption>
            <thead className="sticky top-0 bg-steel-100 text-steel-700">
              <tr>
                <th scope="col" className="px-2 py-1">
                  turn
                </th>
                <th scope="col" className="px-2 py-1">
                  lift ({length.symbol})
                </th>
                {withRise ? (
                  <th scope="col" className="px-2 py-1">
                    rise angle
                  </th>
                ) : null}
                <th scope="col" className="px-2 py-1">
                  force ({force.symbol})
                </th>
                <th scope="col" className="px-2 py-1">
                  holds
                </th>
              </tr>
            </thead>
            <tbody>
              {curve.map((p) => (
                <tr key={p.angleDeg} className={p.engaged ? "text-steel-900" : "text-steel-600"}>
                  <td className="px-2 py-0.5">{p.angleDeg}°</td>
                  <td className="px-2 py-0.5">{trim(p.liftMm * length.perBase, length.decimals)}</td>
                  {withRise ? (
                    <td className="px-2 py-0.5">
                      {p.riseAngleDeg === undefined ? "—" : `${trim(p.riseAngleDeg, 2)}°`}
                    </td>
                  ) : null}
                  <td className="px-2 py-0.5">
                    {p.engaged && p.clampForceN !== null
                      ? trim(p.clampForceN * force.perBase, force.decimals)
                      : "—"}
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

/**
 * The curve in shown units. `force` runs from engagement on; `earlierForce` is the same force up to the
 * engagement point, so the two lines meet there.
 */
export function chartRows(
  curve: readonly CamCurveRow[],
  engageAngleDeg: number,
  forcePerBase: number,
  lengthPerBase: number,
): Array<{ angleDeg: number; lift: number; force: number | null; earlierForce: number | null }> {
  return curve.map((p) => {
    const shown = p.clampForceN === null ? null : p.clampForceN * forcePerBase;
    return {
      angleDeg: p.angleDeg,
      lift: p.liftMm * lengthPerBase,
      force: p.engaged ? shown : null,
      earlierForce: p.engaged && p.angleDeg > engageAngleDeg + 1e-9 ? null : shown,
    };
  });
}

/** Turn ranges where the cam would not hold, widened by half a 5° step so a single point still shows. */
export function slipRanges(curve: readonly CamCurveRow[]): Array<[number, number]> {
  const ranges: Array<[number, number]> = [];
  let start: number | null = null;
  let last = 0;
  for (const p of curve) {
    if (!p.selfLocking && start === null) start = p.angleDeg;
    if (p.selfLocking && start !== null) {
      ranges.push([Math.max(0, start - 2.5), Math.min(180, last + 2.5)]);
      start = null;
    }
    last = p.angleDeg;
  }
  if (start !== null) ranges.push([Math.max(0, start - 2.5), 180]);
  return ranges;
}
