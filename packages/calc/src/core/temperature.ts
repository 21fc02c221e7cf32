import { temperature } from './fields';
import { formatNumber } from './format';
import type { CautionCode } from './cautions';
import type { Step, ValidityWarning } from './report';

/**
 * Design temperature: a shared optional field of every component
 * (`designTemperature`) and of every load case (`loadCases[].temperature`,
 * where a case differs). The engine screens each load case at its own
 * temperature: a method is run once per distinct temperature, with a
 * `TemperatureContext` saying which, and `resolveMaterial(input.material,
 * context)` returns the material's properties at it.
 */

/** Room temperature, K: the temperature the built-in properties are given at when no design temperature is. */
export const ROOM_TEMPERATURE = 293.15;

/** Kelvin of 0 °C, for the text of the trail. */
const ZERO_CELSIUS = 273.15;

/**
 * The hottest design temperature the engine accepts, K (1000 °C): beyond the
 * tables of every material it knows, and beyond what a screening can say.
 */
export const MAX_DESIGN_TEMPERATURE = 1273.15;

/** The coldest design temperature the engine accepts, K (1 K: above absolute zero). */
export const MIN_DESIGN_TEMPERATURE = 1;

/**
 * The design temperature field: text with a unit ("150 degC", "302 degF",
 * "423.15 K") or a number in K; from 1 K to 1000 °C.
 */
export const designTemperatureField = () =>
  temperature({
    min: MIN_DESIGN_TEMPERATURE,
    max: MAX_DESIGN_TEMPERATURE,
    describeIn: 'degC',
  });

/** "150 °C", from K, six significant figures. */
export function celsiusText(kelvin: number): string {
  return `${formatNumber(kelvin - ZERO_CELSIUS)} °C`;
}

/** Kelvin from °C (for tables written in °C). */
export function fromCelsius(celsius: number): number {
  return celsius + ZERO_CELSIUS;
}

/** What a material resolved at a temperature reports besides its values: warnings and cautions. */
export interface TemperatureFindings {
  readonly warnings: ValidityWarning[];
  readonly cautions: CautionCode[];
}

/**
 * The temperature of the load cases one computation of a method is given
 * (the engine runs a method once per distinct temperature, so all its cases
 * share it), and where `resolveMaterial` writes what it finds there.
 */
export interface TemperatureContext {
  /** K. Room temperature (293.15 K) when none is given. */
  readonly value: number;
  /** Whether a temperature was given for these cases (the component's or their own). */
  readonly given: boolean;
  /** Where it comes from, in words, for the trail. */
  readonly source: string;
  /**
   * Filled while the method computes: the warnings and cautions of the
   * materials resolved at this temperature. The engine adds them to the report.
   */
  readonly findings: TemperatureFindings;
}

/** A fresh temperature context (a new place for findings) for one computation. */
export function temperatureContext(
  value: number,
  given: boolean,
  source: string,
): TemperatureContext {
  return { value, given, source, findings: { warnings: [], cautions: [] } };
}

/** Room temperature, nothing given: what a computation outside `screen` (a test, a bench) is given. */
export function roomTemperatureContext(): TemperatureContext {
  return temperatureContext(ROOM_TEMPERATURE, false, 'none given: room temperature, 20 °C');
}

/**
 * The trail step of the temperature a computation's load cases are screened
 * at, second in the report after the ambient pressure (and first in the trail
 * of a load case whose temperature differs from the first case's; its source
 * says whose temperature it is). Written
 * only when a temperature is given somewhere in the component, so a report
 * without one is as it was.
 */
export function temperatureStep(context: TemperatureContext): Step {
  return {
    id: 'design-temperature',
    label: context.given ? 'Design temperature' : 'Temperature (none given: room temperature)',
    expression: 'T',
    substituted: `T = ${celsiusText(context.value)} = ${formatNumber(context.value)} K`,
    value: context.value,
    unit: 'K',
    source: context.source,
  };
}
