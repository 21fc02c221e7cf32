import type { Caution } from './report';

/**
 * The cautions Hoopline attaches to results (PRODUCT.md, "Cautions that must
 * appear"). `screening-only` and `room-temperature` are on every report.
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
      'Every material property, allowable stress and gas property here is taken at room temperature (about ' +
      '20 °C). Strength, elastic modulus and allowable stress fall as the temperature rises (polymers steeply, ' +
      'acrylic and polycarbonate well below 100 °C), and some materials turn brittle in the cold. Screen again ' +
      'with the properties at the design temperature, or the code’s allowable stress at that temperature.',
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
