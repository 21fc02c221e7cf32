/**
 * The demo: Larchmont Applied Materials Lab, a small fictional lab, and its
 * equipment. Our own scenario; every name, address and number in it is
 * invented. The seed builds it through the same services the API uses, so
 * every report is computed by the engine and every revision hashed.
 */
import type { ComponentKind } from '@hoopline/calc';
import type { RevisionStatus, Role } from '@hoopline/contract';

export type DemoPerson = 'theo' | 'dana' | 'ravi' | 'mara';

export interface DemoUser {
  readonly key: DemoPerson;
  readonly email: string;
  readonly name: string;
  readonly isAdmin: boolean;
  /** The role this person shows in the demo, for the printed sign-in sheet. */
  readonly headline: 'admin' | Role;
  /** Used when the installation has no secret of its own (development, tests, e2e). */
  readonly devPassword: string;
  /** For the printed sign-in sheet. */
  readonly can: string;
}

export const DEMO_DOMAIN = 'larchmont.example';

export const DEMO_USERS: readonly DemoUser[] = [
  {
    key: 'theo',
    headline: 'admin',
    email: `theo.brandt@${DEMO_DOMAIN}`,
    name: 'Theo Brandt',
    isAdmin: true,
    devPassword: 'theo-admin-demo-2026',
    can: 'admin: invites people, sets memberships, reads the whole audit log; signs nothing',
  },
  {
    key: 'dana',
    headline: 'designer',
    email: `dana.okafor@${DEMO_DOMAIN}`,
    name: 'Dana Okafor',
    isAdmin: false,
    devPassword: 'dana-designer-demo-2026',
    can: 'designer on LAM-2026-014 and LAM-2026-031 (enters and submits revisions); checker on LAM-2026-021 and LAM-2026-034',
  },
  {
    key: 'ravi',
    headline: 'checker',
    email: `ravi.lindqvist@${DEMO_DOMAIN}`,
    name: 'Ravi Lindqvist',
    isAdmin: false,
    devPassword: 'ravi-checker-demo-2026',
    can: 'checker on LAM-2026-014 and LAM-2026-031 (countersigns or returns); designer on LAM-2026-021 and LAM-2026-034',
  },
  {
    key: 'mara',
    headline: 'fabricator',
    email: `mara.castell@${DEMO_DOMAIN}`,
    name: 'Mara Castell (Castell Fabrication)',
    isAdmin: false,
    devPassword: 'mara-fabricator-demo-2026',
    can: 'fabricator on LAM-2026-014, LAM-2026-031 and LAM-2026-034: sees countersigned revisions only',
  },
];

export interface DemoStep {
  readonly inputs: Record<string, unknown>;
  readonly note: string;
  /** Where this revision ends: left a draft, submitted, or decided by the checker. */
  readonly outcome: RevisionStatus;
  readonly comment?: string;
}

export interface DemoComponent {
  readonly name: string;
  readonly tag: string;
  readonly kind: ComponentKind;
  readonly steps: readonly DemoStep[];
}

export interface DemoProject {
  readonly number: string;
  readonly name: string;
  readonly client: string;
  readonly site: { altitude: number };
  readonly notes: string;
  readonly designer: DemoPerson;
  readonly members: readonly { person: DemoPerson; role: Role }[];
  readonly components: readonly DemoComponent[];
}

const fullVacuum = { name: 'Operating: full vacuum', internal: 'full vacuum' };
const ventBackFill = { name: 'Vent back-fill: +0.2 bar', internal: '0.2 bar(g)' };
/** Glovebox GB-3 runs at ±25 mbar(g) about the room. */
const glovebox = {
  under: { name: 'Design underpressure: −25 mbar(g)', internal: '-25 mbar(g)' },
  over: { name: 'Design overpressure: +25 mbar(g)', internal: '25 mbar(g)' },
};
/** Vacuum oven VO-7 cures at 200 °C under full vacuum and is vented cold. */
const oven = {
  cure: { name: 'Cure: full vacuum at 200 °C', internal: 'full vacuum' },
  vent: {
    name: 'Cold vent back-fill: +0.2 bar at 20 °C',
    internal: '0.2 bar(g)',
    temperature: '20 degC',
  },
};
/** The process chamber's wall (PC-1-S1) as the shell its ports sit in. */
const processChamberWall = {
  shape: 'cylinder',
  diameter: '400 mm',
  diameterBasis: 'outside',
  thickness: '4 mm',
  length: '600 mm',
  material: 'stainless-304',
};

export const DEMO_PROJECTS: readonly DemoProject[] = [
  {
    number: 'LAM-2026-014',
    name: 'Vacuum drying line, bay 3',
    client: 'Larchmont Applied Materials',
    site: { altitude: 340 },
    notes:
      'Drying cabinet VDC-3 with its door and viewport, the door of vacuum oven VO-4 (dries at 180 °C), the process chamber and the pilot reactor head. Screening before the vendor’s code calculation.',
    designer: 'dana',
    members: [
      { person: 'ravi', role: 'checker' },
      { person: 'mara', role: 'fabricator' },
    ],
    components: [
      {
        name: 'VDC-3 cabinet door',
        tag: 'VDC-3-D1',
        kind: 'rectangular-plate',
        steps: [
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '600 mm',
              height: '450 mm',
              thickness: '15 mm',
              edge: 'clamped',
              material: 'stainless-304',
              deflectionLimit: '1.5 mm',
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Door plate welded into its frame: clamped edges.',
            outcome: 'countersigned',
            comment:
              'Clamped edge is right for the welded frame. Deflection within the seal limit.',
          },
        ],
      },
      {
        name: 'VDC-3 door latches',
        tag: 'VDC-3-L1',
        kind: 'flat-area-load',
        steps: [
          {
            inputs: {
              kind: 'flat-area-load',
              outline: { shape: 'rectangle', sealWidth: '620 mm', sealHeight: '470 mm' },
              seating: 'outside',
              fastenerCount: 2,
              fastenerCapacity: '4 kN',
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Two cam latches on the hinge-free side.',
            outcome: 'countersigned',
            comment:
              'Latch share at the vent back-fill checked against the catalogue working load.',
          },
          {
            inputs: {
              kind: 'flat-area-load',
              outline: { shape: 'rectangle', sealWidth: '620 mm', sealHeight: '470 mm' },
              seating: 'outside',
              fastenerCount: 4,
              fastenerCapacity: '4 kN',
              loadCases: [
                fullVacuum,
                ventBackFill,
                { name: 'Proof test: +0.3 bar', internal: '0.3 bar(g)' },
              ],
            },
            note: 'Four latches after the proof-test case was added.',
            outcome: 'countersigned',
            comment: 'Proof-test case added; four latches carry it.',
          },
        ],
      },
      {
        name: 'VDC-3 acrylic viewport',
        tag: 'VDC-3-W1',
        kind: 'circular-plate',
        steps: [
          {
            inputs: {
              kind: 'circular-plate',
              diameter: '150 mm',
              thickness: '8 mm',
              edge: 'simply-supported',
              material: 'cast-acrylic',
              loadCases: [fullVacuum],
            },
            note: 'Viewport in the door, O-ring seated: simply supported.',
            outcome: 'returned',
            comment:
              'Utilisation is over 1 at full vacuum with the brittle-material factor. Thicken the window.',
          },
          {
            inputs: {
              kind: 'circular-plate',
              diameter: '150 mm',
              thickness: '12 mm',
              edge: 'simply-supported',
              material: 'cast-acrylic',
              loadCases: [fullVacuum],
            },
            note: 'Window thickened to 12 mm after the check.',
            outcome: 'submitted',
          },
        ],
      },
      {
        name: 'VO-4 vacuum drying oven door',
        tag: 'VO-4-D1',
        kind: 'rectangular-plate',
        steps: [
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '500 mm',
              height: '450 mm',
              thickness: '10 mm',
              edge: 'simply-supported',
              material: 'stainless-304',
              deflectionLimit: '1.5 mm',
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Oven door on its silicone gasket: simply supported.',
            outcome: 'returned',
            comment:
              'The oven dries at 180 °C: screen the door at its design temperature, not at room temperature. The vent comes in cold.',
          },
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '500 mm',
              height: '450 mm',
              thickness: '10 mm',
              edge: 'simply-supported',
              material: 'stainless-304',
              deflectionLimit: '1.5 mm',
              designTemperature: '180 degC',
              loadCases: [
                { name: 'Drying: full vacuum at 180 °C', internal: 'full vacuum' },
                {
                  name: 'Cold vent back-fill: +0.2 bar at 20 °C',
                  internal: '0.2 bar(g)',
                  temperature: '20 degC',
                },
              ],
            },
            note: 'Design temperature 180 °C; the vent case at 20 °C.',
            outcome: 'submitted',
          },
        ],
      },
      {
        name: 'VDC-3 cabinet side wall',
        tag: 'VDC-3-W1',
        kind: 'stiffened-wall',
        steps: [
          {
            inputs: {
              kind: 'stiffened-wall',
              span: '800 mm',
              spacing: '250 mm',
              thickness: '8 mm',
              panelEdge: 'clamped',
              stiffenerEnds: 'simply-supported',
              stiffenerSide: 'outside',
              stiffener: {
                shape: 'angle',
                depth: '60 mm',
                width: '60 mm',
                thickness: '6 mm',
                rootRadius: '8 mm',
                toeRadius: '4 mm',
              },
              material: 'carbon-steel',
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Side wall of the drying cabinet (the vacuum oven): 8 mm plate on L 60 × 60 × 6 angles at 250 mm.',
            outcome: 'submitted',
          },
        ],
      },
      {
        name: 'Process chamber shell',
        tag: 'PC-1-S1',
        kind: 'cylindrical-shell',
        steps: [
          {
            inputs: {
              kind: 'cylindrical-shell',
              diameter: '400 mm',
              diameterBasis: 'outside',
              thickness: '4 mm',
              length: '600 mm',
              ends: 'closed',
              material: 'stainless-304',
              loadCases: [fullVacuum],
            },
            note: 'First look at the wall for full vacuum between the end flanges.',
            outcome: 'draft',
          },
        ],
      },
      {
        name: 'Process chamber pump port',
        tag: 'PC-1-N1',
        kind: 'opening',
        steps: [
          {
            inputs: {
              kind: 'opening',
              shell: { ...processChamberWall },
              nozzle: {
                outsideDiameter: '168.3 mm',
                thickness: '2.11 mm',
                attachment: 'set-in',
                projection: '120 mm',
                material: 'stainless-304',
                weldLeg: '3 mm',
              },
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Turbo pump port, NPS 6 Sch 5S tube set through the chamber wall, fillet welded outside.',
            outcome: 'submitted',
          },
        ],
      },
      {
        name: 'Process chamber gauge port',
        tag: 'PC-1-N2',
        kind: 'opening',
        steps: [
          {
            inputs: {
              kind: 'opening',
              shell: { ...processChamberWall },
              nozzle: {
                outsideDiameter: '33.4 mm',
                thickness: '1.65 mm',
                attachment: 'set-in',
                projection: '80 mm',
                material: 'stainless-304',
              },
              loadCases: [fullVacuum, ventBackFill],
            },
            note: 'Gauge port, NPS 1 Sch 5S; small enough for the code’s exemption, screened anyway.',
            outcome: 'draft',
          },
        ],
      },
      {
        name: 'Pilot reactor top head',
        tag: 'PR-2-H1',
        kind: 'sphere-or-head',
        steps: [
          {
            inputs: {
              kind: 'sphere-or-head',
              shape: 'ellipsoidal-2-1',
              diameter: '500 mm',
              diameterBasis: 'outside',
              thickness: '6 mm',
              material: 'stainless-316l',
              loadCases: [{ name: 'Design: 6 bar(g)', internal: '6 bar(g)' }, fullVacuum],
            },
            note: '2:1 ellipsoidal head, internal design pressure and a vacuum case for the solvent strip.',
            outcome: 'submitted',
          },
        ],
      },
    ],
  },
  {
    number: 'LAM-2026-021',
    name: 'Glovebox antechamber',
    client: 'Larchmont Applied Materials',
    site: { altitude: 340 },
    notes: 'Small antechamber on glovebox GB-2; Ravi designs, Dana checks.',
    designer: 'ravi',
    members: [{ person: 'dana', role: 'checker' }],
    components: [
      {
        name: 'Antechamber blind cover',
        tag: 'GB-2-A1',
        kind: 'circular-plate',
        steps: [
          {
            inputs: {
              kind: 'circular-plate',
              diameter: '250 mm',
              thickness: '10 mm',
              edge: 'clamped',
              material: 'aluminium-6061-t6',
              deflectionLimit: '0.5 mm',
              loadCases: [fullVacuum],
            },
            note: 'Bolted cover, treated as clamped.',
            outcome: 'draft',
          },
        ],
      },
      {
        name: 'GB-2 glovebox side wall',
        tag: 'GB-2-W1',
        kind: 'stiffened-wall',
        steps: [
          {
            inputs: {
              kind: 'stiffened-wall',
              span: '1000 mm',
              spacing: '400 mm',
              thickness: '3 mm',
              panelEdge: 'clamped',
              stiffenerEnds: 'simply-supported',
              stiffenerSide: 'outside',
              stiffener: { shape: 'flat-bar', depth: '50 mm', thickness: '6 mm' },
              material: 'stainless-316l',
              loadCases: [
                { name: 'Design underpressure: −25 mbar(g)', internal: '-25 mbar(g)' },
                { name: 'Design overpressure: +25 mbar(g)', internal: '25 mbar(g)' },
              ],
            },
            note: 'Glovebox side wall, 316L sheet on 50 × 6 mm flat bars, for the box’s ±25 mbar design pressures.',
            outcome: 'draft',
          },
        ],
      },
    ],
  },
  {
    number: 'LAM-2026-031',
    name: 'Glovebox GB-3, cell assembly line',
    client: 'Larchmont Applied Materials',
    site: { altitude: 340 },
    notes:
      'Argon glovebox GB-3 for the cell assembly line: 316L side walls on flat bars, a polycarbonate viewport, the antechamber door. The box runs at ±25 mbar(g); the antechamber pumps to full vacuum.',
    designer: 'dana',
    members: [
      { person: 'ravi', role: 'checker' },
      { person: 'mara', role: 'fabricator' },
    ],
    components: [
      {
        name: 'GB-3 side wall',
        tag: 'GB-3-W1',
        kind: 'stiffened-wall',
        steps: [
          {
            inputs: {
              kind: 'stiffened-wall',
              span: '900 mm',
              spacing: '350 mm',
              thickness: '3 mm',
              panelEdge: 'clamped',
              stiffenerEnds: 'simply-supported',
              stiffenerSide: 'outside',
              stiffener: { shape: 'flat-bar', depth: '50 mm', thickness: '6 mm' },
              material: 'stainless-316l',
              loadCases: [glovebox.under, glovebox.over],
            },
            note: '3 mm 316L sheet on 50 × 6 mm flat bars at 350 mm, between the frame rails 900 mm apart.',
            outcome: 'countersigned',
            comment: 'Panel and stiffener both well inside their allowables at ±25 mbar(g).',
          },
        ],
      },
      {
        name: 'GB-3 polycarbonate viewport',
        tag: 'GB-3-V1',
        kind: 'rectangular-plate',
        steps: [
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '400 mm',
              height: '300 mm',
              thickness: '6 mm',
              edge: 'simply-supported',
              material: 'polycarbonate',
              loadCases: [glovebox.under, glovebox.over],
            },
            note: 'Front viewport, 6 mm polycarbonate on a gasket in a bolted frame: simply supported.',
            outcome: 'countersigned',
            comment:
              'Brittle-material factor applied; keep solvent wipes off it (crazing caution on the sheet).',
          },
        ],
      },
      {
        name: 'GB-3 antechamber door',
        tag: 'GB-3-A1',
        kind: 'circular-plate',
        steps: [
          {
            inputs: {
              kind: 'circular-plate',
              diameter: '400 mm',
              thickness: '12 mm',
              edge: 'clamped',
              material: 'stainless-316l',
              deflectionLimit: '1 mm',
              loadCases: [fullVacuum],
            },
            note: 'Antechamber door, pumped to full vacuum for each transfer.',
            outcome: 'submitted',
          },
        ],
      },
    ],
  },
  {
    number: 'LAM-2026-034',
    name: 'Vacuum oven VO-7, resin cure',
    client: 'Larchmont Applied Materials',
    site: { altitude: 340 },
    notes:
      'Cylindrical vacuum oven VO-7 for resin cure at 200 °C: its stiffened rear wall, the pump port in the shell, the door. Ravi designs, Dana checks.',
    designer: 'ravi',
    members: [
      { person: 'dana', role: 'checker' },
      { person: 'mara', role: 'fabricator' },
    ],
    components: [
      {
        name: 'VO-7 rear wall',
        tag: 'VO-7-W1',
        kind: 'stiffened-wall',
        steps: [
          {
            inputs: {
              kind: 'stiffened-wall',
              span: '700 mm',
              spacing: '200 mm',
              thickness: '8 mm',
              panelEdge: 'clamped',
              stiffenerEnds: 'simply-supported',
              stiffenerSide: 'outside',
              stiffener: { shape: 'flat-bar', depth: '80 mm', thickness: '10 mm' },
              material: 'stainless-304',
              designTemperature: '200 degC',
              loadCases: [oven.cure, oven.vent],
            },
            note: 'Rear wall, 8 mm 304 on 80 × 10 mm flat bars at 200 mm, screened at the 200 °C cure.',
            outcome: 'countersigned',
            comment:
              'Properties at 200 °C from the derating tables; the cold vent case does not govern.',
          },
        ],
      },
      {
        name: 'VO-7 pump port',
        tag: 'VO-7-N1',
        kind: 'opening',
        steps: [
          {
            inputs: {
              kind: 'opening',
              shell: {
                shape: 'cylinder',
                diameter: '600 mm',
                diameterBasis: 'outside',
                thickness: '6 mm',
                length: '800 mm',
                material: 'stainless-304',
              },
              nozzle: {
                outsideDiameter: '114.3 mm',
                thickness: '3.05 mm',
                attachment: 'set-in',
                projection: '100 mm',
                material: 'stainless-304',
                weldLeg: '4 mm',
              },
              designTemperature: '200 degC',
              loadCases: [oven.cure],
            },
            note: 'Pump port, NPS 4 Sch 10S set into the 6 mm shell, at the cure temperature.',
            outcome: 'countersigned',
            comment: 'Area replacement holds at 200 °C without a pad.',
          },
        ],
      },
      {
        name: 'VO-7 door',
        tag: 'VO-7-D1',
        kind: 'rectangular-plate',
        steps: [
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '500 mm',
              height: '500 mm',
              thickness: '16 mm',
              edge: 'simply-supported',
              material: 'stainless-304',
              deflectionLimit: '1.5 mm',
              designTemperature: '200 degC',
              loadCases: [oven.cure],
            },
            note: 'Square door on its gasket, 16 mm 304, at 200 °C.',
            outcome: 'countersigned',
            comment: 'Fine for the cure case.',
          },
          {
            inputs: {
              kind: 'rectangular-plate',
              width: '500 mm',
              height: '500 mm',
              thickness: '20 mm',
              edge: 'simply-supported',
              material: 'stainless-304',
              deflectionLimit: '1.5 mm',
              designTemperature: '200 degC',
              loadCases: [oven.cure, oven.vent],
            },
            note: 'Thickened to 20 mm and the cold vent back-fill added.',
            outcome: 'countersigned',
            comment: 'Vent case added; supersedes revision 1.',
          },
        ],
      },
    ],
  },
];
