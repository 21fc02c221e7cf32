import { q, worded } from '../core/worded';
import type { CautionCode } from '../core/cautions';
import { withUnit } from '../core/format';
import type { ResolvedLoadCase, ValidityWarning } from '../core/report';
import type { Trail } from '../core/trail';
import type { Material } from '../materials/materials';
import { HIGHLY_HAZARDOUS_ENERGY } from './stored-energy/stored-energy';

/**
 * The hazard of the energy a shell or head holds (Hoopline method notes §h),
 * from the gas volume it encloses: the implosion work Δp·V of the atmosphere
 * on an evacuated one, and the Brode energy Δp·V/(γ − 1) of a gas-filled one
 * under internal pressure. Above 100 kJ ("highly hazardous", UC Berkeley EHS)
 * a caution-level warning gives the figure.
 */

/** Ratio of specific heats of air, for the Brode energy of a gas-filled vessel (kinetic theory, diatomic). */
const AIR_HEAT_CAPACITY_RATIO = 1.4;

export interface EnclosedVolume {
  readonly value: number;
  readonly label: string;
  readonly expression: string;
  readonly substituted: string;
  readonly source: string;
}

export interface VesselHazards {
  /** The atmosphere's work on the evacuated volume exceeds the threshold. */
  readonly largeEvacuatedVolume: boolean;
  /** The Brode energy of the gas-filled volume exceeds the threshold. */
  readonly highStoredEnergy: boolean;
}

/**
 * Writes the enclosed volume, the implosion work (outside-higher cases) and
 * the Brode energy if gas-filled (inside-higher cases) as common steps, and
 * warns above the threshold.
 */
export function vesselEnergySteps(
  trail: Trail,
  warnings: ValidityWarning[],
  volume: EnclosedVolume,
  loadCases: readonly ResolvedLoadCase[],
): VesselHazards {
  const V = trail.step({
    id: 'enclosed-volume',
    label: volume.label,
    expression: volume.expression,
    substituted: volume.substituted,
    value: volume.value,
    unit: 'm³',
    source: volume.source,
  });
  let external = 0;
  let internal = 0;
  for (const lc of loadCases) {
    if (lc.direction === 'external-over') external = Math.max(external, -lc.differential);
    if (lc.direction === 'internal-over') internal = Math.max(internal, lc.differential);
  }
  let largeEvacuatedVolume = false;
  let highStoredEnergy = false;
  if (external > 0) {
    const work = trail.step({
      id: 'implosion-energy',
      label: 'Implosion work of the outside pressure on the enclosed volume (upper bound)',
      expression: 'W = Δp·V',
      substituted: `W = ${withUnit(external, 'Pa')}·${withUnit(V, 'm³')}`,
      value: external * V,
      unit: 'J',
      source:
        'work of the outside pressure on an evacuated vessel that implodes, largest outside-higher case (Hoopline method notes §h, derived)',
    });
    if (work > HIGHLY_HAZARDOUS_ENERGY) {
      largeEvacuatedVolume = true;
      warnings.push({
        code: 'implosion-energy',
        severity: 'caution',
        ...worded`the atmosphere's work on the evacuated volume is ${q('work', work, 'J', { as: 'kJ' })}, above the ${q('limit', HIGHLY_HAZARDOUS_ENERGY, 'J', { as: 'kJ' })} UC Berkeley EHS calls "highly hazardous": an implosion throws fragments; keep people clear or behind a shield`,
      });
    }
  }
  if (internal > 0) {
    const energy = trail.step({
      id: 'stored-energy-brode',
      label: 'Energy stored if the vessel is filled with gas (Brode), largest inside-higher case',
      expression: 'E_B = Δp·V/(γ − 1), γ = cp/cv = 1.4 (air)',
      substituted: `E_B = ${withUnit(internal, 'Pa')}·${withUnit(V, 'm³')}/(1.4 − 1)`,
      value: (internal * V) / (AIR_HEAT_CAPACITY_RATIO - 1),
      unit: 'J',
      source:
        'Brode constant-volume energy (from memory; Hoopline method notes §h), air as an ideal diatomic gas; a test with water stores far less',
    });
    if (energy > HIGHLY_HAZARDOUS_ENERGY) {
      highStoredEnergy = true;
      warnings.push({
        code: 'stored-energy-high',
        severity: 'caution',
        ...worded`filled with gas, the enclosed volume stores ${q('energy', energy, 'J', { as: 'kJ' })} (Brode), above the ${q('limit', HIGHLY_HAZARDOUS_ENERGY, 'J', { as: 'kJ' })} UC Berkeley EHS calls "highly hazardous": test hydrostatically, keep people clear and use barricades`,
      });
    }
  }
  return { largeEvacuatedVolume, highStoredEnergy };
}

/**
 * The hazard cautions of a component: implosion under external pressure for
 * a brittle wall or a large evacuated volume; stored energy under internal
 * pressure (shells and heads, whose volume is known: always, and a warning
 * gives the figure above the threshold).
 */
export function hazardCautions(
  material: Material,
  loadCases: readonly ResolvedLoadCase[],
  hazards: VesselHazards | null,
): CautionCode[] {
  const cautions: CautionCode[] = [];
  const external = loadCases.some((lc) => lc.direction === 'external-over');
  const internal = loadCases.some((lc) => lc.direction === 'internal-over');
  if (external && (material.brittle || hazards?.largeEvacuatedVolume)) cautions.push('implosion');
  if (internal && hazards) cautions.push('stored-energy');
  return cautions;
}
