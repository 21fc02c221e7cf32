import { useId } from 'react';

/**
 * Points of the buckled ring r(θ) = R + w·cos(nθ): the circumferential mode
 * shape of a cylinder under external pressure with n lobes (n full waves
 * round the circumference). The amplitude is for the picture only.
 */
export function modeShapePoints(
  lobes: number,
  radius: number,
  amplitude: number,
  segments = 360,
): { x: number; y: number }[] {
  return Array.from({ length: segments }, (_, i) => {
    const theta = (2 * Math.PI * i) / segments;
    const r = radius + amplitude * Math.cos(lobes * theta);
    return { x: r * Math.cos(theta), y: r * Math.sin(theta) };
  });
}

export function modeShapePath(
  lobes: number,
  cx: number,
  cy: number,
  radius: number,
  amplitude: number,
  segments = 360,
): string {
  return (
    modeShapePoints(lobes, radius, amplitude, segments)
      .map((p, i) => `${i === 0 ? 'M' : 'L'}${(cx + p.x).toFixed(2)},${(cy - p.y).toFixed(2)}`)
      .join(' ') + ' Z'
  );
}

export function BucklingModeShape({ lobes, size = 200 }: { lobes: number; size?: number }) {
  const titleId = useId();
  const n = Math.max(2, Math.round(lobes));
  const c = size / 2;
  const radius = size * 0.36;
  // A lobe amplitude that stays readable for many lobes: smaller as n grows.
  const amplitude = radius * Math.min(0.12, 0.6 / n);
  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${size} ${size}`}
        role="img"
        aria-labelledby={titleId}
        className="h-auto w-full max-w-[220px]"
      >
        <title id={titleId}>{`Buckling mode shape with ${n} circumferential lobes`}</title>
        <circle
          cx={c}
          cy={c}
          r={radius}
          fill="none"
          className="stroke-line-strong"
          strokeDasharray="4 3"
        />
        <path
          d={modeShapePath(n, c, c, radius, amplitude)}
          className="fill-accent-soft stroke-accent"
          strokeWidth={2}
        />
        <text x={c} y={c + 4} textAnchor="middle" className="fill-ink text-[13px] font-semibold">
          n = {n}
        </text>
      </svg>
      <figcaption className="text-xs text-muted">
        Buckling mode: {n} lobes round the circumference (r(θ) = R + w·cos(nθ), amplitude
        exaggerated).
      </figcaption>
    </figure>
  );
}
