import { Document, Image, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import {
  formatSignificant,
  kindName,
  presentInputs,
  presentReport,
  sketchOf,
  type PresentedReport,
  type PresentedStep,
} from '@hoopline/present';
import { FONT_FAMILY, MONO_FAMILY } from './fonts';
import { STAMP_TEXT, type SheetData } from './sheet-data';
import { SketchPdf } from './sketch-pdf';

/**
 * The stamped-for-review sheet: a title block of our own, the verdict, load
 * cases, inputs (project units with SI alongside), checks, the full trail,
 * validity warnings, cautions and attachments; on every page a diagonal stamp
 * and a footer with the content hash, the verify code and its QR code
 * ("Page x of y" goes below it after layout: page-numbers.ts).
 *
 * Every number and word of the report comes from @hoopline/present's
 * presentReport, the same one the web app's report view prints, so the sheet
 * cannot show a number differently from the screen.
 */

const INK = '#1e293b';
const MUTED = '#64748b';
const RULE = '#cbd5e1';
const ACCENT = '#0f766e';
const FAIL = '#b91c1c';

const styles = StyleSheet.create({
  page: {
    fontFamily: FONT_FAMILY,
    fontSize: 8,
    color: INK,
    paddingTop: 56,
    paddingBottom: 92,
    paddingHorizontal: 36,
  },
  runningHead: {
    position: 'absolute',
    top: 22,
    left: 36,
    right: 36,
    flexDirection: 'row',
    justifyContent: 'space-between',
    borderBottomWidth: 1,
    borderBottomColor: ACCENT,
    paddingBottom: 4,
    fontSize: 7.5,
  },
  brand: { fontWeight: 600, letterSpacing: 1.2, color: ACCENT },
  titleBlock: { borderWidth: 1, borderColor: INK, marginBottom: 10 },
  titleRow: { flexDirection: 'row' },
  titleCell: {
    flex: 1,
    padding: 4,
    borderRightWidth: 1,
    borderRightColor: RULE,
    borderBottomWidth: 1,
    borderBottomColor: RULE,
  },
  titleCellLast: { flex: 1, padding: 4, borderBottomWidth: 1, borderBottomColor: RULE },
  label: { fontSize: 6.5, color: MUTED, textTransform: 'uppercase', letterSpacing: 0.6 },
  value: { fontSize: 9, fontWeight: 500 },
  sheetTitle: {
    fontSize: 13,
    fontWeight: 600,
    padding: 6,
    borderBottomWidth: 1,
    borderBottomColor: INK,
  },
  caution: {
    borderLeftWidth: 3,
    borderLeftColor: '#d97706',
    backgroundColor: '#fffbeb',
    padding: 6,
    marginBottom: 10,
  },
  cautionTitle: { fontWeight: 600, marginBottom: 2 },
  verdict: {
    padding: 6,
    marginBottom: 10,
    borderWidth: 1,
  },
  h2: { fontSize: 10, fontWeight: 600, marginTop: 8, marginBottom: 4, color: ACCENT },
  h3: { fontSize: 8.5, fontWeight: 600, marginTop: 6, marginBottom: 3 },
  table: { borderTopWidth: 1, borderTopColor: INK },
  row: {
    flexDirection: 'row',
    borderBottomWidth: 0.5,
    borderBottomColor: RULE,
    paddingVertical: 2,
  },
  headRow: {
    flexDirection: 'row',
    borderBottomWidth: 1,
    borderBottomColor: INK,
    paddingVertical: 2,
    fontWeight: 600,
  },
  cell: { paddingRight: 4 },
  small: { fontSize: 7, color: MUTED },
  mono: { fontFamily: MONO_FAMILY, fontSize: 7 },
  // No lineHeight factor: on the page it made react-pdf 4.9 drop the fixed,
  // absolutely placed footer, and on a View it spread lines far apart.
  body: {},
  stamp: {
    position: 'absolute',
    top: 360,
    left: -80,
    width: 760,
    textAlign: 'center',
    fontSize: 28,
    fontWeight: 700,
    color: FAIL,
    opacity: 0.16,
    transform: 'rotate(-32deg)',
  },
  footer: {
    position: 'absolute',
    bottom: 22,
    left: 36,
    right: 36,
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: INK,
    paddingTop: 4,
    // Below the footer the bottom margin stays empty: "Page x of y" is drawn
    // there after layout (page-numbers.ts).
  },
  footerText: { flex: 1, fontSize: 6.5, paddingRight: 8 },
  qr: { width: 54, height: 54 },
});

/**
 * A formula with room to break: a space between an operator and the
 * bracket it opens ("·(" → "· ("). react-pdf breaks lines only at spaces;
 * inside a "word" it breaks anyway and adds a hyphen, which in a formula
 * reads as a minus sign.
 */
// The line breaker's "infinite" penalty: it never breaks there unless nothing else fits.
const NEVER_HYPHENATE = 10_000;

export function breakable(formula: string): string {
  return formula.replace(/([·/+=×])\(/g, '$1 (');
}

function Cell({
  width,
  children,
  bold,
  mono,
  color,
}: {
  width: string;
  children: React.ReactNode;
  bold?: boolean;
  mono?: boolean;
  color?: string;
}) {
  return (
    <Text
      style={[
        styles.cell,
        { width },
        ...(bold ? [{ fontWeight: 600 }] : []),
        ...(mono ? [styles.mono] : []),
        ...(color ? [{ color }] : []),
      ]}
      hyphenationPenalty={NEVER_HYPHENATE}
    >
      {children}
    </Text>
  );
}

function TitleCell({ label, value, last }: { label: string; value: string; last?: boolean }) {
  return (
    <View style={last ? styles.titleCellLast : styles.titleCell}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.value}>{value || '—'}</Text>
    </View>
  );
}

function when(iso: string | null): string {
  if (!iso) return '—';
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}

function VerdictBanner({ shown }: { shown: PresentedReport }) {
  const colour =
    shown.verdict.code === 'fail' ? FAIL : shown.verdict.code === 'pass' ? ACCENT : '#b45309';
  return (
    <View style={[styles.verdict, { borderColor: colour }]}>
      <Text style={{ fontWeight: 600, color: colour, marginBottom: 2 }}>
        Screening result: {shown.verdict.sentence}
      </Text>
      <Text>
        {shown.governing
          ? `Governing: ${shown.governing.checkLabel} in load case ${shown.governing.loadCase} at ${shown.governing.utilisation}`
          : 'No governing check'}
      </Text>
    </View>
  );
}

function LoadCases({ shown }: { shown: PresentedReport }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        1 Load cases
      </Text>
      <View style={styles.table}>
        <View style={styles.headRow}>
          <Cell width="20%">Case</Cell>
          <Cell width="13%">Inside (abs)</Cell>
          <Cell width="13%">Outside (abs)</Cell>
          <Cell width="13%">Δp</Cell>
          <Cell width="11%">Higher side</Cell>
          <Cell width="7%">Factor</Cell>
          <Cell width="23%">As given</Cell>
        </View>
        {shown.cases.map((c, index) => (
          <View key={`${c.name}-${index}`} style={styles.row} wrap={false}>
            <Cell width="20%">{c.name}</Cell>
            <Cell width="13%">{c.inside}</Cell>
            <Cell width="13%">{c.outside}</Cell>
            <Cell width="13%">{c.differential}</Cell>
            <Cell width="11%">{c.direction}</Cell>
            <Cell width="7%">{c.factor ?? '1'}</Cell>
            <Cell width="23%">{c.description}</Cell>
          </View>
        ))}
      </View>
      <Text style={styles.small}>Ambient {shown.ambient}.</Text>
    </View>
  );
}

function Inputs({ data }: { data: SheetData }) {
  const rows = presentInputs(data.revision.inputs, data.project.unitSystem, {
    omit: ['loadCases'],
  });
  // A US-customary project shows its own units beside SI; an SI project needs SI once.
  const both = data.project.unitSystem === 'us';
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        2 Inputs
      </Text>
      <View style={styles.table}>
        <View style={styles.headRow}>
          <Cell width={both ? '30%' : '40%'}>Field</Cell>
          <Cell width={both ? '24%' : '32%'}>As entered</Cell>
          {both ? <Cell width="23%">US customary</Cell> : null}
          <Cell width={both ? '23%' : '28%'}>SI</Cell>
        </View>
        {rows.map((r) => (
          <View key={r.path} style={styles.row} wrap={false}>
            <Cell width={both ? '30%' : '40%'}>{r.label}</Cell>
            <Cell width={both ? '24%' : '32%'}>{r.asTyped}</Cell>
            {both ? <Cell width="23%">{r.inSystem}</Cell> : null}
            <Cell width={both ? '23%' : '28%'}>{r.inSi}</Cell>
          </View>
        ))}
      </View>
    </View>
  );
}

function SketchSection({ data }: { data: SheetData }) {
  const sketch = sketchOf(data.revision.report, data.project.unitSystem);
  if (!sketch) return null;
  return (
    <View wrap={false}>
      <Text style={styles.h3}>Sketch</Text>
      <SketchPdf sketch={sketch} width={300} />
      <Text style={styles.small}>
        {sketch.title}
        {sketch.note ? ` ${sketch.note}` : ''}
      </Text>
    </View>
  );
}

function ChecksTable({ shown }: { shown: PresentedReport }) {
  const rows = shown.cases.flatMap((c) => c.checks.map((check) => ({ caseName: c.name, check })));
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        3 Checks
      </Text>
      {rows.length === 0 ? (
        <Text>This method computes quantities without a pass/fail criterion.</Text>
      ) : (
        <View style={styles.table}>
          <View style={styles.headRow}>
            <Cell width="18%">Case</Cell>
            <Cell width="30%">Check</Cell>
            <Cell width="15%">Demand</Cell>
            <Cell width="15%">Capacity</Cell>
            <Cell width="11%">Utilisation</Cell>
            <Cell width="11%">Result</Cell>
          </View>
          {rows.map(({ caseName, check }, index) => (
            <View key={`${index}/${check.id}`} style={styles.row} wrap={false}>
              <Cell width="18%">{caseName}</Cell>
              <Cell width="30%" bold={check.governing}>
                {check.label}
                {check.governing ? ' (governing)' : ''}
              </Cell>
              <Cell width="15%">{check.demand}</Cell>
              <Cell width="15%">{check.capacity}</Cell>
              <Cell width="11%">{check.utilisation}</Cell>
              <Cell width="11%" bold color={check.pass ? ACCENT : FAIL}>
                {check.result}
              </Cell>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

function StepRows({ steps }: { steps: readonly PresentedStep[] }) {
  return (
    <View style={styles.table}>
      <View style={styles.headRow}>
        <Cell width="6%">#</Cell>
        <Cell width="20%">Step</Cell>
        <Cell width="30%">Expression and substituted values</Cell>
        <Cell width="16%">Value</Cell>
        <Cell width="28%">Source</Cell>
      </View>
      {steps.map((s) => (
        <View key={s.number} style={styles.row} wrap={false}>
          <Cell width="6%">{String(s.number)}</Cell>
          <Cell width="20%">{s.label}</Cell>
          {/* One text block (expression, then the substituted values in small type):
              one layout instead of two per step. */}
          <Text style={[styles.cell, { width: '30%' }]} hyphenationPenalty={NEVER_HYPHENATE}>
            {breakable(s.expression)}
            {'\n'}
            <Text style={styles.small}>{breakable(s.substituted)}</Text>
          </Text>
          <Text style={[styles.cell, { width: '16%' }]} hyphenationPenalty={NEVER_HYPHENATE}>
            {s.unit ? `${s.value} ${s.unit}` : s.value}
            {s.shownAs ? (
              <Text style={styles.small}>
                {'\n'}
                {s.shownAs}
              </Text>
            ) : null}
          </Text>
          <Cell width="28%">{s.source}</Cell>
        </View>
      ))}
    </View>
  );
}

function Trail({ shown }: { shown: PresentedReport }) {
  const common = shown.steps.filter((s) => s.caseIndex === null);
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        4 Calculation trail
      </Text>
      <Text style={styles.small}>
        Every step as computed by the engine, numbered as on screen; values in SI, with the
        project’s units below where they differ.
      </Text>
      {common.length > 0 ? (
        <View>
          <Text style={styles.h3}>Common to every load case</Text>
          <StepRows steps={common} />
        </View>
      ) : null}
      {shown.cases.map((c, index) => (
        <View key={`${c.name}-${index}`}>
          <Text style={styles.h3} minPresenceAhead={40}>
            Load case {index + 1}: {c.name}
          </Text>
          <StepRows steps={shown.steps.filter((s) => s.caseIndex === index)} />
        </View>
      ))}
    </View>
  );
}

function Warnings({ shown }: { shown: PresentedReport }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        5 Validity warnings
      </Text>
      {shown.warnings.length === 0 ? (
        <Text>None: every method was used within its stated range.</Text>
      ) : (
        shown.warnings.map((w, i) => (
          <Text
            key={`${w.code}-${i}`}
            style={{ marginBottom: 2, color: w.severityCode === 'outside-validity' ? FAIL : INK }}
          >
            {w.severity}
            {w.loadCase ? ` (${w.loadCase})` : ''}: {w.message}
          </Text>
        ))
      )}
    </View>
  );
}

function Cautions({ shown }: { shown: PresentedReport }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        6 Cautions
      </Text>
      {shown.cautions.map((c) => (
        <View key={c.code} style={{ marginBottom: 4 }} wrap={false}>
          <Text style={{ fontWeight: 600 }}>{c.title}</Text>
          <Text>{c.text}</Text>
        </View>
      ))}
    </View>
  );
}

function Attachments({ data }: { data: SheetData }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={60}>
        7 Attachments
      </Text>
      {data.attachments.length === 0 ? (
        <Text>None.</Text>
      ) : (
        <View style={styles.table}>
          <View style={styles.headRow}>
            <Cell width="40%">File</Cell>
            <Cell width="12%">Size</Cell>
            <Cell width="48%">SHA-256</Cell>
          </View>
          {data.attachments.map((a) => (
            <View key={a.sha256 + a.name} style={styles.row} wrap={false}>
              <Cell width="40%">{a.name}</Cell>
              <Cell width="12%">{`${formatSignificant(a.size / 1024)} KiB`}</Cell>
              <Cell width="48%" mono>
                {`${a.sha256.slice(0, 32)}\n${a.sha256.slice(32)}`}
              </Cell>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

export function SheetDocument({ data, qrDataUrl }: { data: SheetData; qrDataUrl: string }) {
  const { project, component, revision, author, countersign } = data;
  const report = revision.report;
  const shown = presentReport(report, project.unitSystem);
  const stamp = STAMP_TEXT[data.stamp];
  return (
    <Document
      title={`${project.number} ${component.name} rev ${revision.number}`}
      author="Hoopline"
      subject={`Screening sheet, content hash ${revision.contentHash}`}
      creator="Hoopline"
      producer="Hoopline"
    >
      <Page size={data.paperSize} style={styles.page}>
        <View style={styles.runningHead} fixed>
          <Text style={styles.brand}>HOOPLINE · SCREENING SHEET</Text>
          <Text>
            {project.number} · {component.name} · rev {revision.number} · {revision.status}
          </Text>
        </View>
        <Text style={styles.stamp} fixed>
          {stamp}
        </Text>
        <View style={styles.footer} fixed>
          <View style={styles.footerText}>
            <Text>
              Content hash (SHA-256 of inputs, engine version and report):{' '}
              <Text style={styles.mono}>{revision.contentHash}</Text>
            </Text>
            <Text>
              Verify code{' '}
              <Text style={[styles.mono, { fontSize: 9, fontWeight: 500 }]}>
                {revision.verifyCode}
              </Text>{' '}
              at {data.verifyUrl}
            </Text>
            <Text>
              {stamp}. Screening only; defer to the applicable code and a qualified engineer.
              Generated {when(data.generatedAt)}.
            </Text>
          </View>
          <Image style={styles.qr} src={qrDataUrl} />
        </View>

        <View style={styles.body}>
          <View style={styles.titleBlock}>
            <Text style={styles.sheetTitle}>{report.title}</Text>
            <View style={styles.titleRow}>
              <TitleCell label="Project" value={`${project.number} — ${project.name}`} />
              <TitleCell label="Client" value={project.client} />
              <TitleCell
                label="Component"
                value={`${component.name}${component.tag ? ` (${component.tag})` : ''}`}
              />
              <TitleCell label="Kind" value={kindName(component.kind)} last />
            </View>
            <View style={styles.titleRow}>
              <TitleCell label="Revision" value={`${revision.number} — ${revision.status}`} />
              <TitleCell
                label="Prepared by"
                value={`${author.name}, ${when(revision.submittedAt ?? revision.createdAt)}`}
              />
              <TitleCell
                label="Countersigned by"
                value={
                  countersign ? `${countersign.checker}, ${when(countersign.at)}` : 'not checked'
                }
              />
              <TitleCell label="Engine" value={`hoopline-calc ${revision.engineVersion}`} last />
            </View>
          </View>

          <View style={styles.caution}>
            <Text style={styles.cautionTitle}>Screening only — not a code calculation</Text>
            <Text>
              This sheet records a first-pass screening by textbook formulas. Final design,
              fabrication and testing must follow the applicable pressure-equipment code (for
              example ASME BPVC Section VIII, EN 13445, the Pressure Equipment Directive) and local
              regulations, and be approved by a qualified engineer (licensed where the law requires
              it).
            </Text>
          </View>

          <VerdictBanner shown={shown} />
          {revision.note ? (
            <Text style={{ marginBottom: 6 }}>Revision note: {revision.note}</Text>
          ) : null}
          {countersign?.comment ? (
            <Text style={{ marginBottom: 6 }}>Checker’s comment: {countersign.comment}</Text>
          ) : null}

          <LoadCases shown={shown} />
          <Inputs data={data} />
          <SketchSection data={data} />
          <ChecksTable shown={shown} />
          <Trail shown={shown} />
          <Warnings shown={shown} />
          <Cautions shown={shown} />
          <Attachments data={data} />
        </View>
      </Page>
    </Document>
  );
}
