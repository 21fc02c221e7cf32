import type { Caution } from './report';

/**
 * The cautions Hoopline attaches to results (PRODUCT.md, "Cautions that must
 * appear"). `screening-only` is on every report, and second to it the
 * temperature caution: `room-temperature` where no temperature is given,
 * `design-temperature` where one is.
 */
export const CAUTIONS = {
  'screening-only': {
    code: 'screening-only',
    title: 'Screening only — not a code calculation',
    text:
      'This is a first-pass screening by textbook formulas, not a design to a pressure-equipment code. ' +
      'Final design, fabrication and testing must follow the applicable code (for example ASME BPVC Section VIII, ' +
      'EN 13445, the Pressure Equipment Directive) and local regulations, and be approved by a qualified engineer ' +
      '(licensed where the law requires it).',
  },
  'room-temperature': {
    code: 'room-temperature',
    title: 'Properties at room temperature',
    text:
      'No design temperature is given, so every material property, allowable stress and gas property here is ' +
      'taken at room temperature (about 20 °C). Strength, elastic modulus and allowable stress fall as the ' +
      'temperature rises (polymers steeply, acrylic and polycarbonate well below 100 °C), and some materials turn ' +
      'brittle in the cold. Give the design temperature of the component, or of a load case, and the built-in ' +
      'metals are derated to it; or screen with the code’s allowable stress at that temperature.',
  },
  'design-temperature': {
    code: 'design-temperature',
    title: 'Properties at the design temperature',
    text:
      'Each load case is screened at its temperature, which the trail states. The built-in metals take their ' +
      'elastic modulus and their yield and tensile strengths, and with them the allowable stress, at that ' +
      'temperature from the published elevated-temperature tables the trail names (ASME II-D Tables TM-1, Y-1 and ' +
      'U for the steels, EN 1999-1-2 for aluminium); at room temperature these are their room-temperature values. ' +
      'Not derated: Poisson’s ratio, density, the joint efficiency, a polymer’s long-term modulus, and the ' +
      'properties of polymers, glass and custom materials without a temperature table, which stand at their ' +
      'room-temperature values with a warning away from it. Not considered: creep and other time-dependent ' +
      'strength (the screening is outside validity from the start of the creep range, 371 °C for carbon steel ' +
      'and 510 °C for austenitic stainless steel, from memory), thermal stresses from temperature differences, ' +
      'long exposure of tempered aluminium, and the ratings of seals, fasteners and window mounts at temperature.',
  },
  'creep-range': {
    code: 'creep-range',
    title: 'Creep range',
    text:
      'At this temperature the metal creeps: under sustained load it keeps deforming, and the code allowable ' +
      'stress is set by its creep-rupture and creep-rate strength, well below the time-independent allowable ' +
      'screened here. Use the code’s allowable stress at the design temperature and a creep assessment.',
  },
  'low-temperature': {
    code: 'low-temperature',
    title: 'Brittle fracture at low temperature',
    text:
      'Below its low-temperature limit the material can fracture without warning at stresses below those ' +
      'screened here. This screening does not check toughness: establish the minimum design metal temperature ' +
      'and the impact-test requirements of the applicable code (for example ASME VIII-1 UG-20, UCS-66 and UHA-51), ' +
      'or the maker’s lower service limit for a polymer.',
  },
  'brittle-material': {
    code: 'brittle-material',
    title: 'Brittle material',
    text:
      'Glass, acrylic and polycarbonate fail without warning, creep under sustained load and craze or crack with ' +
      'solvents and cleaning agents. Use larger design factors, the maker’s long-term design stress, protect ' +
      'against impact and scratches, and guard people against fragments.',
  },
  'polymer-creep': {
    code: 'polymer-creep',
    title: 'Polymer creep and crazing',
    text:
      'Polymers creep: the long-term allowable stress is far below the short-term strength, and falls with ' +
      'temperature. Cast acrylic under continuous load is usually held to about 10 MPa (1500 psi) at 23 °C or ' +
      'less to avoid crazing (common practice, from memory). Under sustained load the effective (creep) modulus ' +
      'falls too, and with it the buckling pressure and the stiffness of a window: use the maker’s long-term ' +
      'modulus for the time and temperature of service.',
  },
  'external-pressure-imperfection': {
    code: 'external-pressure-imperfection',
    title: 'Buckling is imperfection-sensitive',
    text:
      'Buckling under external pressure depends strongly on out-of-roundness, dents, weld distortion and ' +
      'residual stress. Classical buckling pressures are not safe on their own: the allowable here applies a ' +
      'knock-down and a design factor, which a code method (for example ASME VIII-1 UG-28 or EN 13445-3 ' +
      'clause 8) must confirm, with the fabrication tolerances it requires.',
  },
  'stored-energy': {
    code: 'stored-energy',
    title: 'Stored energy hazard',
    text:
      'A vessel under pressure stores energy that a failure releases at once. A pressure test with gas is far ' +
      'more dangerous than with water; test hydrostatically where possible, keep people clear and use ' +
      'barricades. An evacuated vessel can implode and throw fragments, especially glass and acrylic.',
  },
  implosion: {
    code: 'implosion',
    title: 'Implosion hazard',
    text:
      'An evacuated vessel stores energy: if its wall gives way the atmosphere does the work Δp·V on it at ' +
      'once (about 100 kJ for one cubic metre at full vacuum), and a glass or acrylic wall bursts inward ' +
      'and then throws fragments out. Keep people clear or behind a shield, guard brittle walls against ' +
      'impact and scratches, and let air in slowly.',
  },
  'small-deflection': {
    code: 'small-deflection',
    title: 'Small-deflection plate theory',
    text:
      'Flat-plate results are linear small-deflection theory. When the deflection exceeds about half the ' +
      'thickness, membrane action stiffens the plate and the linear results overstate stress and deflection; ' +
      'use large-deflection solutions or a finite-element analysis.',
  },
  'edge-condition': {
    code: 'edge-condition',
    title: 'Real edges lie between simply supported and clamped',
    text:
      'A bolted, clamped or gasketed edge is neither fully fixed nor free to rotate. Screen both edge conditions ' +
      'where the support is uncertain; a welded-in plate is closer to clamped, a plate on an O-ring closer to ' +
      'simply supported.',
  },
  'closure-loads': {
    code: 'closure-loads',
    title: 'Closure and fastener loads',
    text:
      'Fastener loads here are the pressure load shared equally. Bolts on a pressurised closure also carry ' +
      'gasket seating and operating loads and any prying; on a vacuum door the frame, hinges and seal flange ' +
      'carry the load. Check fasteners, hinges and frames by the applicable code.',
  },
  'vacuum-pumping': {
    code: 'vacuum-pumping',
    title: 'Pump-down is an estimate',
    text:
      'The exponential pump-down assumes a constant effective pumping speed in the viscous range. Outgassing, ' +
      'water vapour (below about 10–100 Pa in an unbaked chamber), conductance of lines and the fall of pump ' +
      'speed near its base pressure all make the real time longer.',
  },
  'opening-welds-not-checked': {
    code: 'opening-welds-not-checked',
    title: 'Weld strength at the opening is not checked',
    text:
      'Area replacement counts the weld metal as reinforcement but does not check that the welds can carry the ' +
      'load of the reinforcement into the shell: the weld strength paths of ASME VIII-1 UG-41, the minimum weld ' +
      'sizes of UW-16 and the nozzle neck minimum of UG-45 are not checked here. Check them by the applicable code.',
  },
  'nozzle-loads': {
    code: 'nozzle-loads',
    title: 'Nozzle loads are not included',
    text:
      'Only pressure is screened. Forces and moments from connected piping, its weight, thermal expansion and ' +
      'supports, and loads from equipment on a port (a pump, a valve, a viewport frame) raise the stresses at the ' +
      'nozzle well above those of pressure alone: check them by a local-load method (for example WRC 107/537 or ' +
      'WRC 297, or EN 13445-3 clause 16) or a finite-element analysis.',
  },
  'opening-fatigue': {
    code: 'opening-fatigue',
    title: 'Fatigue at the opening is not assessed',
    text:
      'The peak stress at a nozzle-to-shell junction is several times the membrane stress. Area replacement is a ' +
      'rule for static pressure; a vessel cycled in pressure or temperature (a vacuum chamber pumped down and ' +
      'vented many times, a receiver that cycles) needs a fatigue assessment of its openings by the applicable code.',
  },
  'stiffener-welds': {
    code: 'stiffener-welds',
    title: 'Stiffeners act through their welds',
    text:
      'A stiffener carries its share of the plate only through the welds that join them: they carry the ' +
      'shear flow given in the trail. Intermittent or one-sided welds let the plate slip past the stiffener ' +
      'between welds, so less of it acts with the stiffener than the effective width assumes, and a stiffener ' +
      'over a gap acts alone. Fixed ends need welds or bolts that carry the end moment into a frame stiff ' +
      'enough to hold it. Size the welds and end connections by the applicable code.',
  },
  'stiffener-stability': {
    code: 'stiffener-stability',
    title: 'Stiffener tripping and lateral buckling are not screened',
    text:
      'Where its free edge is in compression a stiffener can twist and buckle sideways (tripping, ' +
      'lateral–torsional buckling) before it yields, a slender flat bar or an unbraced angle soonest. The ' +
      'screening checks stresses, deflection and the local slenderness of the section, not this: brace the ' +
      'free edge (a flange, tripping brackets, a tie to the next stiffener) or check it by a structural code ' +
      '(for example EN 1993-1-1 or AISC 360).',
  },
  'ring-stiffeners': {
    code: 'ring-stiffeners',
    title: 'Stiffening rings: attachment, gaps and tripping',
    text:
      'The ring sizing assumes rings welded to the shell all round (ASME VIII-1 UG-30 allows intermittent ' +
      'welds only within its limits), no gaps beyond those UG-29(c) permits, rings no farther apart than the ' +
      'spacing used here and the shell’s out-of-roundness within the code’s tolerance. A ring’s free flange ' +
      'in compression can trip; check its welds, its stability and any cut-outs by the applicable code.',
  },
} as const satisfies Record<string, Caution>;

export type CautionCode = keyof typeof CAUTIONS;

export function caution(code: CautionCode): Caution {
  return CAUTIONS[code];
}
