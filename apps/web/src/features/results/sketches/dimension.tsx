/** Arrowheads for dimension lines; one <defs> per sketch, ids made unique by the caller. */
export function DimensionDefs({ id }: { id: string }) {
  return (
    <defs>
      <marker
        id={`${id}-arrow`}
        viewBox="0 0 10 10"
        refX="10"
        refY="5"
        markerWidth="7"
        markerHeight="7"
        orient="auto-start-reverse"
      >
        <path d="M0,0 L10,5 L0,10 z" className="fill-ink" />
      </marker>
      <pattern
        id={`${id}-hatch`}
        width="6"
        height="6"
        patternUnits="userSpaceOnUse"
        patternTransform="rotate(45)"
      >
        <line x1="0" y1="0" x2="0" y2="6" className="stroke-muted" strokeWidth="1.5" />
      </pattern>
    </defs>
  );
}

/**
 * A dimension between two points with extension lines, offset to one side,
 * and its text at the middle.
 */
export function Dimension({
  id,
  x1,
  y1,
  x2,
  y2,
  offset,
  label,
}: {
  id: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Perpendicular distance of the dimension line from the measured points, px (sign picks the side). */
  offset: number;
  label: string;
}) {
  const dx = x2 - x1;
  const dy = y2 - y1;
  const length = Math.hypot(dx, dy) || 1;
  const nx = -dy / length;
  const ny = dx / length;
  const ax = x1 + nx * offset;
  const ay = y1 + ny * offset;
  const bx = x2 + nx * offset;
  const by = y2 + ny * offset;
  const mx = (ax + bx) / 2 + nx * (offset >= 0 ? 11 : -5);
  const my = (ay + by) / 2 + ny * (offset >= 0 ? 11 : -5);
  const vertical = Math.abs(dy) > Math.abs(dx);
  return (
    <g className="text-ink">
      <line
        x1={x1 + nx * 2}
        y1={y1 + ny * 2}
        x2={ax + nx * 4}
        y2={ay + ny * 4}
        className="stroke-muted"
        strokeWidth={0.8}
      />
      <line
        x1={x2 + nx * 2}
        y1={y2 + ny * 2}
        x2={bx + nx * 4}
        y2={by + ny * 4}
        className="stroke-muted"
        strokeWidth={0.8}
      />
      <line
        x1={ax}
        y1={ay}
        x2={bx}
        y2={by}
        className="stroke-ink"
        strokeWidth={1}
        markerStart={`url(#${id}-arrow)`}
        markerEnd={`url(#${id}-arrow)`}
      />
      <text
        x={mx}
        y={my + (vertical ? 3 : 0)}
        textAnchor={vertical ? (offset >= 0 ? 'end' : 'start') : 'middle'}
        className="fill-ink text-[11px] font-medium"
        transform={vertical ? undefined : undefined}
      >
        {label}
      </text>
    </g>
  );
}
