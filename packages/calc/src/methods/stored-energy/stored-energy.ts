import { q, worded } from '../../core/worded';
import { z } from 'zod';
import { given } from '../../core/given';
import { energy, factor, volume } from '../../core/fields';
import { formatNumber, withUnit } from '../../core/format';
import { componentShape, defineMethod } from '../../core/method';
import type { ResolvedLoadCase } from '../../core/report';
import { Trail } from '../../core/trail';
import { TNT_ENERGY_PER_KG } from '../../units/units';
import { storedEnergyVocabulary } from './vocabulary';

/**
 * Energy stored in a gas-filled or evacuated vessel (Hoopline method notes §h): the
 * Brode constant-volume energy, the isentropic expansion work and the
 * isothermal upper bound for a vessel under internal pressure, and the work
 * the atmosphere does on an evacuated vessel that implodes; each also as a
 * TNT equivalent.
 */

/** UC Berkeley EHS: "one gram of TNT contains 4.62 kJ" (ehs.berkeley.edu, stored energy of a pressurised gas vessel). */
export const TNT_ENERGY_PER_KG_BERKELEY = 4.62e6;
/** Stored energy above which UC Berkeley EHS calls a vessel "highly hazardous", J. */
export const HIGHLY_HAZARDOUS_ENERGY = 100e3;
/** Bulk modulus of water near 20 °C, Pa (from memory), for the liquid-filled comparison. */
export const WATER_BULK_MODULUS = 2.2e9;
/** Vapour pressure of carbon dioxide at 20 °C, Pa (about 57 bar, from memory): above it CO2 in a cylinder is liquid. */
const CO2_VAPOUR_PRESSURE_20C = 5.73e6;

const GAS_IDS = ['air', 'nitrogen', 'oxygen', 'helium', 'argon', 'carbon-dioxide'] as const;
export type StoredEnergyGas = (typeof GAS_IDS)[number];

const DIATOMIC =
  'ideal rigid diatomic gas, cp/cv = 7/5 (kinetic theory); about 1.40 measured near room temperature (from memory)';
const MONATOMIC = 'ideal monatomic gas, cp/cv = 5/3 (kinetic theory: cv = 3R/2, cp = 5R/2)';

/** Ratio of specific heats γ = cp/cv near room temperature, with where each comes from. */
export const GASES: Readonly<
  Record<
    StoredEnergyGas,
    { readonly name: string; readonly heatCapacityRatio: number; readonly source: string }
  >
> = {
  air: { name: 'air', heatCapacityRatio: 1.4, source: DIATOMIC },
  nitrogen: { name: 'nitrogen', heatCapacityRatio: 1.4, source: DIATOMIC },
  oxygen: {
    name: 'oxygen',
    heatCapacityRatio: 1.4,
    source: `${DIATOMIC}; 1.395 for oxygen (from memory)`,
  },
  helium: { name: 'helium', heatCapacityRatio: 5 / 3, source: MONATOMIC },
  argon: { name: 'argon', heatCapacityRatio: 5 / 3, source: MONATOMIC },
  'carbon-dioxide': {
    name: 'carbon dioxide',
    heatCapacityRatio: 1.29,
    source:
      'ideal-gas cp = 0.846 kJ/(kg·K) and R = 0.1889 kJ/(kg·K) at 300 K give 1.29 (from memory); the lower end of the 1.28–1.30 quoted, so the larger energy',
  },
};

export const storedEnergySchema = z
  .object(
    componentShape('stored-energy', {
      /** Gas volume of the vessel (its internal volume, less any liquid). */
      volume: volume({ positive: true, max: 1e5 }),
      gas: z
        .enum(GAS_IDS, {
          error: `must be one of ${GAS_IDS.map((g) => `"${g}"`).join(', ')}`,
        })
        .default('air'),
      /** γ = cp/cv, instead of the gas's own value. */
      heatCapacityRatio: factor(1.01, 1.7, 'heat capacity ratio').optional(),
      /** An energy above which the case fails (checked against the Brode or implosion energy). */
      energyLimit: energy({ positive: true }).optional(),
    }),
  )
  .strict();

export type StoredEnergyInput = z.input<typeof storedEnergySchema>;
type Parsed = z.output<typeof storedEnergySchema>;

function tntStep(trail: Trail, id: string, label: string, energyValue: number): number {
  return trail.step({
    id,
    label,
    expression: 'm_TNT = E/(4.184 MJ/kg)',
    substituted: `m_TNT = ${withUnit(energyValue, 'J')}/${withUnit(TNT_ENERGY_PER_KG, 'J/kg')}`,
    value: energyValue / TNT_ENERGY_PER_KG,
    unit: 'kg',
    source:
      'conventional TNT equivalent, 1 ton TNT = 4.184e9 J (NIST SP 811 App. B.9 footnote), chosen for unit consistency',
  });
}

function hazardWarning(trail: Trail, energyValue: number, what: string): void {
  if (energyValue > HIGHLY_HAZARDOUS_ENERGY) {
    trail.warn(
      'highly-hazardous',
      'caution',
      worded`${what} ${q('energy', energyValue, 'J', { as: 'kJ' })} is above ${q('limit', HIGHLY_HAZARDOUS_ENERGY, 'J', { as: 'kJ' })}, "highly hazardous" per UC Berkeley EHS: keep people clear, barricade, and test hydrostatically`,
    );
  }
}

function energyCheck(
  trail: Trail,
  input: Parsed,
  energyValue: number,
  label: string,
  basis: string,
  energyPerPressure: number,
): void {
  if (input.energyLimit === undefined) return;
  trail.check({
    id: 'stored-energy',
    label,
    demand: energyValue,
    capacity: input.energyLimit,
    unit: 'J',
    basis,
  });
  trail.output(
    'allowable-pressure',
    'Pressure difference at the energy limit',
    input.energyLimit / energyPerPressure,
    'Pa',
  );
}

function caseTrail(input: Parsed, gamma: number, v: number, loadCase: ResolvedLoadCase): Trail {
  const trail = new Trail();
  const dp = trail.differential(loadCase, {
    id: 'pressure-difference',
    label: 'Pressure difference across the wall',
    symbol: 'Δp',
  });
  trail.output('pressure-difference', 'Pressure difference', dp, 'Pa');

  if (loadCase.direction === 'external-over') {
    const work = trail.step({
      id: 'implosion-energy',
      label: 'Implosion work done by the outside pressure (upper bound)',
      expression: 'W = (p_out − p_in)·V',
      substituted: `W = ${withUnit(dp, 'Pa')}·${withUnit(v, 'm³')}`,
      value: dp * v,
      unit: 'J',
      source:
        'work of the outside pressure on a volume that collapses to nothing (Hoopline method notes §h, derived); an upper bound',
    });
    const tnt = tntStep(trail, 'implosion-tnt', 'Implosion work as TNT equivalent', work);
    trail.output('implosion-energy', 'Implosion work', work, 'J');
    trail.output('tnt-equivalent', 'TNT equivalent (4.184 MJ/kg)', tnt, 'kg');
    hazardWarning(trail, work, 'the implosion work');
    energyCheck(
      trail,
      input,
      work,
      'Implosion work against the energy limit',
      'W <= energy limit',
      v,
    );
    return trail;
  }

  if (loadCase.direction === 'balanced') {
    const none = trail.step({
      id: 'brode-energy',
      label: 'No pressure difference: no stored energy',
      expression: 'E = 0',
      substituted: 'E = 0 J',
      value: 0,
      unit: 'J',
      source: 'no pressure difference',
    });
    trail.output('brode-energy', 'Stored energy (Brode)', none, 'J');
    energyCheck(
      trail,
      input,
      0,
      'Stored energy against the energy limit',
      'E <= energy limit',
      v / (gamma - 1),
    );
    return trail;
  }

  const p0 = loadCase.external;
  const p1 = trail.step({
    id: 'absolute-pressure-inside',
    label: 'Absolute pressure of the gas inside',
    expression: 'p1 = p0 + Δp',
    substituted: `p1 = ${withUnit(p0, 'Pa')} + ${withUnit(dp, 'Pa')}`,
    value: p0 + dp,
    unit: 'Pa',
    source:
      loadCase.factor !== 1
        ? 'outside pressure plus the factored pressure difference'
        : 'outside pressure plus the pressure difference',
  });
  const gammaText = formatNumber(gamma);
  const brode = trail.step({
    id: 'brode-energy',
    label: 'Stored energy, constant-volume release (Brode)',
    expression: 'E_B = (p1 − p0)·V/(γ − 1)',
    substituted: `E_B = (${withUnit(p1, 'Pa')} − ${withUnit(p0, 'Pa')})·${withUnit(v, 'm³')}/(${gammaText} − 1)`,
    value: (dp * v) / (gamma - 1),
    unit: 'J',
    source:
      'Brode (1959), as used in Baker/Strehlow NASA CR-134779 and CR-3023 (from memory; Hoopline method notes §h)',
  });
  const isentropic = trail.step({
    id: 'isentropic-energy',
    label: 'Isentropic expansion work to the outside pressure',
    expression: 'E_s = p1·V/(γ − 1)·[1 − (p0/p1)^((γ − 1)/γ)]',
    substituted: `E_s = ${withUnit(p1, 'Pa')}·${withUnit(v, 'm³')}/(${gammaText} − 1)·[1 − (${withUnit(p0, 'Pa')}/${withUnit(p1, 'Pa')})^((${gammaText} − 1)/${gammaText})]`,
    value: ((p1 * v) / (gamma - 1)) * (1 - (p0 / p1) ** ((gamma - 1) / gamma)),
    unit: 'J',
    source:
      'isentropic expansion of an ideal gas (LLNL ES&H Manual form, as quoted; Hoopline method notes §h)',
  });
  let isothermal: number | null = null;
  if (p0 > 0) {
    isothermal = trail.step({
      id: 'isothermal-energy',
      label: 'Isothermal expansion work (upper bound for a slow release)',
      expression: 'E_T = p1·V·ln(p1/p0)',
      substituted: `E_T = ${withUnit(p1, 'Pa')}·${withUnit(v, 'm³')}·ln(${withUnit(p1, 'Pa')}/${withUnit(p0, 'Pa')})`,
      value: p1 * v * Math.log(p1 / p0),
      unit: 'J',
      source:
        'isothermal ideal-gas expansion; worked example "Energy in Pressure Vessels", 50 L CNG cylinder at 200 bar (Hoopline method notes §h)',
    });
  } else {
    trail.step({
      id: 'isothermal-energy',
      label: 'Isothermal expansion work',
      expression: 'E_T = p1·V·ln(p1/p0)',
      substituted:
        'p0 = 0: unbounded for an expansion into vacuum; the Brode and isentropic values stand',
      value: null,
      unit: 'J',
      source: 'isothermal ideal-gas expansion (Hoopline method notes §h)',
    });
  }
  const tntBrode = tntStep(trail, 'brode-tnt', 'Brode energy as TNT equivalent', brode);
  trail.step({
    id: 'brode-tnt-berkeley',
    label: 'Brode energy as TNT equivalent at the UC Berkeley EHS figure',
    expression: 'm_TNT = E_B/(4.62 MJ/kg)',
    substituted: `m_TNT = ${withUnit(brode, 'J')}/${withUnit(TNT_ENERGY_PER_KG_BERKELEY, 'J/kg')}`,
    value: brode / TNT_ENERGY_PER_KG_BERKELEY,
    unit: 'kg',
    source: 'UC Berkeley EHS, "one gram of TNT contains 4.62 kJ" (for comparison only)',
  });
  tntStep(trail, 'isentropic-tnt', 'Isentropic work as TNT equivalent', isentropic);
  if (isothermal !== null) {
    tntStep(trail, 'isothermal-tnt', 'Isothermal work as TNT equivalent', isothermal);
  }
  const liquid = trail.step({
    id: 'liquid-test-energy',
    label: 'The same pressure with the vessel full of water (hydrostatic test), for comparison',
    expression: 'E_w = V·Δp²/(2·K)',
    substituted: `E_w = ${withUnit(v, 'm³')}·(${withUnit(dp, 'Pa')})²/(2·${withUnit(WATER_BULK_MODULUS, 'Pa')})`,
    value: (v * dp * dp) / (2 * WATER_BULK_MODULUS),
    unit: 'J',
    source:
      'elastic energy of a compressed liquid, K = 2.2 GPa for water (from memory); the shell’s own strain energy comes on top in both cases',
  });
  trail.output('brode-energy', 'Stored energy (Brode)', brode, 'J');
  trail.output('isentropic-energy', 'Isentropic expansion work', isentropic, 'J');
  if (isothermal !== null)
    trail.output('isothermal-energy', 'Isothermal expansion work', isothermal, 'J');
  trail.output(
    'tnt-equivalent',
    'TNT equivalent of the Brode energy (4.184 MJ/kg)',
    tntBrode,
    'kg',
  );
  trail.output('liquid-test-energy', 'Stored energy if filled with water', liquid, 'J');
  hazardWarning(trail, brode, 'the stored energy (Brode)');
  if (input.gas === 'carbon-dioxide' && p1 > CO2_VAPOUR_PRESSURE_20C) {
    trail.warn(
      'co2-liquid',
      'outside-validity',
      worded`carbon dioxide at ${q('pressure', p1, 'Pa', { as: 'MPa', absolute: true })}(a) is above its vapour pressure at ${q('temperature', 293.15, 'K', { as: '°C' })} (about ${q('vapourPressure', 5.7e6, 'Pa', { as: 'MPa', absolute: true })}, from memory): it is liquid in the vessel, and a flashing liquid stores far more energy than these ideal-gas formulas give`,
    );
  }
  if (p1 > 20e6) {
    trail.warn(
      'real-gas',
      'info',
      worded`at ${q('pressure', p1, 'Pa', { as: 'MPa', absolute: true })}(a) a real gas departs from the ideal gas these formulas assume by several per cent (from memory)`,
    );
  }
  energyCheck(
    trail,
    input,
    brode,
    'Stored energy (Brode) against the energy limit',
    'E_B <= energy limit',
    v / (gamma - 1),
  );
  return trail;
}

export const storedEnergy = defineMethod({
  kind: 'stored-energy',
  name: 'Stored energy',
  summary: 'Energy released if a vessel bursts or implodes, with its TNT equivalent.',
  description:
    'Energy a gas-filled vessel releases on failure (Brode, isentropic, isothermal upper bound) or the atmosphere does on an evacuated vessel that implodes, in joules and kilograms of TNT, with the hazard caution.',
  schema: storedEnergySchema,
  vocabulary: storedEnergyVocabulary,
  absolutePressures: ['absolute-pressure-inside'],
  compute(input, context) {
    const common = new Trail();
    const v = common.step({
      id: 'gas-volume',
      label: 'Gas volume',
      expression: 'V = given',
      substituted: `V = ${withUnit(input.volume, 'm³')}`,
      value: input.volume,
      unit: 'm³',
      source: 'entered by the user',
    });
    const gas = GASES[input.gas];
    const gamma = common.step({
      id: 'heat-capacity-ratio',
      label: `Ratio of specific heats of ${input.heatCapacityRatio !== undefined ? 'the gas' : gas.name}`,
      expression: 'γ = cp/cv',
      substituted:
        input.heatCapacityRatio !== undefined
          ? `γ = ${formatNumber(input.heatCapacityRatio)} (given)`
          : `γ = ${formatNumber(gas.heatCapacityRatio)}`,
      value: input.heatCapacityRatio ?? gas.heatCapacityRatio,
      unit: '1',
      source: input.heatCapacityRatio !== undefined ? 'entered by the user' : gas.source,
    });
    const cases = context.loadCases.map((lc) => caseTrail(input, gamma, v, lc));
    const anyInternal = context.loadCases.some((lc) => lc.direction === 'internal-over');
    return {
      title: `Stored energy, ${formatNumber(v * 1000)} L of ${gas.name}`,
      inputs: {
        volume: input.volume,
        gas: input.gas,
        heatCapacityRatio: gamma,
        ...given(input, 'energyLimit'),
      },
      steps: common.steps,
      cases,
      warnings: anyInternal
        ? [
            {
              code: 'liquid-test',
              severity: 'info' as const,
              message:
                'a liquid-filled (hydrostatic) test at the same pressure stores far less energy than gas, because a liquid hardly compresses: test with water where possible, and vent all trapped air first',
            },
          ]
        : [],
      // Implosion: the atmosphere's work on an evacuated volume above the threshold.
      cautions: context.loadCases.some(
        (lc) => lc.direction === 'external-over' && -lc.differential * v > HIGHLY_HAZARDOUS_ENERGY,
      )
        ? ['stored-energy', 'implosion']
        : ['stored-energy'],
    };
  },
  examples: [
    {
      name: 'Lab air receiver, 50 L at 10 bar(g), and the same vessel evacuated',
      input: {
        kind: 'stored-energy',
        volume: '50 L',
        gas: 'air',
        loadCases: [
          { name: 'Working: 10 bar(g)', internal: '10 bar(g)' },
          { name: 'Evacuated', internal: 'full vacuum' },
        ],
      },
    },
    {
      name: 'Glove-box antechamber, 1 m³ at full vacuum, 50 kJ limit',
      input: {
        kind: 'stored-energy',
        volume: '1 m3',
        energyLimit: '50 kJ',
        loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
      },
    },
  ],
});
