/**
 * A small working sketch of an eccentric cam against a workpiece: the circle turns about a pivot that is
 * offset by the eccentricity e, so its edge rises by e(1 − cos φ) as the lever comes over.
 */
export function CamSketch({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 220 150" className={className} role="img" aria-labelledby="cam-sketch-title">
      <title id="cam-sketch-title">Sketch: an eccentric cam pressing a workpiece down onto a table</title>
      <rect x="10" y="124" width="200" height="16" fill="var(--color-steel-300)" />
      <rect
        x="40"
        y="96"
        width="120"
        height="28"
        fill="var(--color-steel-200)"
        stroke="var(--color-steel-500)"
      />
      <text
        x="100"
        y="115"
        textAnchor="middle"
        className="figure"
        fontSize="10"
        fill="var(--color-steel-700)"
      >
        workpiece
      </text>
      <circle
        cx="100"
        cy="58"
        r="38"
        fill="var(--color-spark-400)"
        stroke="var(--color-spark-700)"
        strokeWidth="2"
      />
      <circle cx="100" cy="48" r="6" fill="var(--color-steel-900)" />
      <line
        x1="100"
        y1="48"
        x2="196"
        y2="14"
        stroke="var(--color-steel-800)"
        strokeWidth="7"
        strokeLinecap="round"
      />
      <circle cx="100" cy="58" r="2" fill="var(--color-steel-900)" />
      <line
        x1="100"
        y1="48"
        x2="100"
        y2="58"
        stroke="var(--color-steel-900)"
        strokeWidth="1"
        strokeDasharray="2 2"
      />
      <text x="82" y="56" className="figure" fontSize="10" fill="var(--color-steel-900)">
        e
      </text>
      <text x="150" y="46" className="figure" fontSize="10" fill="var(--color-steel-700)">
        lever
      </text>
      <path d="M100 96 v-4" stroke="var(--color-steel-900)" strokeWidth="2" />
    </svg>
  );
}
