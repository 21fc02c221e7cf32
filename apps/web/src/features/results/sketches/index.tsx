import type { Report } from '@hoopline/calc';
import { sketchOf } from '@hoopline/present';
import { useMemo } from 'react';
import type { UnitSystem } from '@hoopline/contract';
import { SketchSvg } from './sketch-svg';
import { useReaderUnits } from '../../../lib/unit-system';

/**
 * The sketch for a report (@hoopline/present's sketchOf, the one the sheet
 * prints), or nothing for a kind without one.
 */
export function ComponentSketch({ report, system }: { report: Report; system: UnitSystem }) {
  // Vacuum levels in the reader's vacuum unit, as in the rest of the report.
  const { vacuumUnit } = useReaderUnits();
  const sketch = useMemo(
    () => sketchOf(report, { system, vacuumUnit }),
    [report, system, vacuumUnit],
  );
  return sketch ? <SketchSvg sketch={sketch} /> : null;
}

/** The lobe count of a cylinder's buckling mode, from its outputs, if the report has one. */
export function lobeCount(report: Report): number | null {
  if (report.kind !== 'cylindrical-shell') return null;
  const governingCase = report.cases[report.governing?.caseIndex ?? 0] ?? report.cases[0];
  const candidates = [governingCase, ...report.cases];
  for (const c of candidates) {
    const output = c?.outputs.find((o) => /lobe/i.test(o.id) || /lobe/i.test(o.label));
    if (output && Number.isFinite(output.value) && output.value >= 2)
      return Math.round(output.value);
  }
  return null;
}
