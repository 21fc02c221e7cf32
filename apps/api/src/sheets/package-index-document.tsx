import { Document, Image, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import {
  PACKAGE_WORDS,
  VERDICT_WORDS,
  engineNote,
  formatPercent,
  isoInstant,
  kindName,
} from '@hoopline/present';
import { FONT_FAMILY, MONO_FAMILY } from './fonts';
import type { PackageIndexData, PackagePageRanges } from './package-data';
import { STAMP_TEXT } from './sheet-data';

/**
 * The index sheet of an issue package: the project, the package code with
 * its QR code, and one row a component (its countersigned revision, content
 * hash, the designer's and the checker's sign-offs with ISO dates, the
 * governing check and utilisation from the stored report, and where its
 * sheet sits in the package), or "not countersigned". Every number and word
 * through @hoopline/present, as the sheet and the screen print them.
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
  title: { fontSize: 14, fontWeight: 600, marginBottom: 4 },
  codeBlock: {
    flexDirection: 'row',
    borderWidth: 1,
    borderColor: INK,
    padding: 6,
    marginBottom: 10,
  },
  codeText: { flex: 1, paddingRight: 8 },
  label: { fontSize: 6.5, color: MUTED, textTransform: 'uppercase', letterSpacing: 0.6 },
  code: { fontFamily: MONO_FAMILY, fontSize: 13, fontWeight: 500, marginBottom: 3 },
  mono: { fontFamily: MONO_FAMILY, fontSize: 6.5 },
  qr: { width: 64, height: 64 },
  caution: {
    borderLeftWidth: 3,
    borderLeftColor: '#d97706',
    backgroundColor: '#fffbeb',
    padding: 6,
    marginBottom: 10,
  },
  cautionTitle: { fontWeight: 600, marginBottom: 2 },
  headRow: {
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: INK,
    borderBottomWidth: 1,
    borderBottomColor: INK,
    paddingVertical: 2,
    fontWeight: 600,
  },
  entry: { borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 3 },
  row: { flexDirection: 'row' },
  cell: { paddingRight: 4 },
  small: { fontSize: 7, color: MUTED },
  date: { fontFamily: MONO_FAMILY, fontSize: 6.5 },
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
    borderTopWidth: 1,
    borderTopColor: INK,
    paddingTop: 4,
    fontSize: 6.5,
  },
});

const WIDTHS = {
  component: '24%',
  revision: '6%',
  prepared: '18%',
  countersigned: '18%',
  governing: '20%',
  verdict: '8%',
  pages: '6%',
} as const;

// The line breaker's "infinite" penalty (as on the sheet): an ISO date is never split with a hyphen.
const NEVER_HYPHENATE = 10_000;

function Cell({
  width,
  children,
  bold,
}: {
  width: string;
  children: React.ReactNode;
  bold?: boolean;
}) {
  return (
    <Text
      style={[styles.cell, { width }, ...(bold ? [{ fontWeight: 600 }] : [])]}
      hyphenationPenalty={NEVER_HYPHENATE}
    >
      {children}
    </Text>
  );
}

/** "2026-03-14T09:12:05Z" (ISO 8601, UTC). */
const when = (value: string | null) => (value ? isoInstant(value) : '—');

export function PackageIndexDocument({
  data,
  pages,
  qrDataUrl,
}: {
  data: PackageIndexData;
  pages: PackagePageRanges;
  qrDataUrl: string;
}) {
  const { project } = data;
  const included = data.entries.filter((e) => e.revision).length;
  const stamp = STAMP_TEXT.review;
  return (
    <Document
      title={`${project.number} issue package ${data.packageCode}`}
      author="Hoopline"
      subject={`Issue package, package hash ${data.packageHash}`}
      creator="Hoopline"
      producer="Hoopline"
    >
      <Page size={data.paperSize} style={styles.page}>
        <View style={styles.runningHead} fixed>
          <Text style={styles.brand}>HOOPLINE · ISSUE PACKAGE</Text>
          <Text>
            {project.number} · index · {data.packageCode}
          </Text>
        </View>
        <Text style={styles.stamp} fixed>
          {stamp}
        </Text>
        <View style={styles.footer} fixed>
          <Text>
            {stamp}. Screening only; defer to the applicable code and a qualified engineer. Index of
            package {data.packageCode}, generated {when(data.generatedAt)}.
          </Text>
        </View>

        <Text style={styles.title}>
          {PACKAGE_WORDS.title}: {project.number} — {project.name}
        </Text>
        {project.client ? <Text style={{ marginBottom: 6 }}>Client: {project.client}</Text> : null}

        <View style={styles.codeBlock}>
          <View style={styles.codeText}>
            <Text style={styles.label}>Package code</Text>
            <Text style={styles.code}>{data.packageCode}</Text>
            <Text>
              Verify at {data.verifyUrl}: the answer lists every revision this package holds and
              says whether a later one has been countersigned since.
            </Text>
            <Text style={{ marginTop: 2 }}>
              Package hash (SHA-256 of the project id and the sorted content hashes):{' '}
              <Text style={styles.mono}>{data.packageHash}</Text>
            </Text>
            <Text style={{ marginTop: 2 }}>
              {included} countersigned {included === 1 ? 'sheet follows' : 'sheets follow'} this
              index ({pages.totalPages} pages in all, the index {pages.indexPages}); each sheet
              keeps its own page numbers.
            </Text>
          </View>
          <Image style={styles.qr} src={qrDataUrl} />
        </View>

        <View style={styles.caution}>
          <Text style={styles.cautionTitle}>Screening only — not a code calculation</Text>
          <Text>
            This package records first-pass screenings by textbook formulas. Final design,
            fabrication and testing must follow the applicable pressure-equipment code (for example
            ASME BPVC Section VIII, EN 13445, the Pressure Equipment Directive) and local
            regulations, and be approved by a qualified engineer (licensed where the law requires
            it).
          </Text>
        </View>

        <View style={styles.headRow} fixed>
          <Cell width={WIDTHS.component}>Component</Cell>
          <Cell width={WIDTHS.revision}>Rev</Cell>
          <Cell width={WIDTHS.prepared}>Prepared and submitted</Cell>
          <Cell width={WIDTHS.countersigned}>Countersigned</Cell>
          <Cell width={WIDTHS.governing}>Governing check, utilisation</Cell>
          <Cell width={WIDTHS.verdict}>Verdict</Cell>
          <Cell width={WIDTHS.pages}>Pages</Cell>
        </View>
        {data.entries.map((entry, index) => {
          const r = entry.revision;
          const range = pages.ranges[index] ?? null;
          const name = `${entry.componentName}${entry.tag ? ` (${entry.tag})` : ''}`;
          const note = r ? engineNote(r.engineVersion, data.engineVersion) : null;
          return (
            <View key={index} style={styles.entry} wrap={false}>
              <View style={styles.row}>
                <Cell width={WIDTHS.component} bold>
                  {name}
                  {'\n'}
                  <Text style={styles.small}>{kindName(entry.kind)}</Text>
                </Cell>
                {r ? (
                  <>
                    <Cell width={WIDTHS.revision}>{r.number}</Cell>
                    <Cell width={WIDTHS.prepared}>
                      {r.preparedBy}
                      {'\n'}
                      <Text style={styles.date}>{when(r.submittedAt)}</Text>
                    </Cell>
                    <Cell width={WIDTHS.countersigned}>
                      {r.countersignedBy}
                      {'\n'}
                      <Text style={styles.date}>{when(r.countersignedAt)}</Text>
                    </Cell>
                    <Cell width={WIDTHS.governing}>
                      {r.governing
                        ? `${r.governing.checkLabel} (${r.governing.loadCase}): ${formatPercent(r.governing.utilisation)}`
                        : '—'}
                    </Cell>
                    <Cell width={WIDTHS.verdict}>{VERDICT_WORDS[r.verdict].word}</Cell>
                    <Cell width={WIDTHS.pages}>{range ? `${range.first}–${range.last}` : '—'}</Cell>
                  </>
                ) : (
                  <Text style={[styles.cell, { width: '76%', color: MUTED }]}>
                    {PACKAGE_WORDS.notCountersigned}: {PACKAGE_WORDS.notIncluded}
                  </Text>
                )}
              </View>
              {r ? (
                <Text style={[styles.small, { marginTop: 1 }]}>
                  Content hash <Text style={styles.mono}>{r.contentHash}</Text> · verify code{' '}
                  <Text style={styles.mono}>{r.verifyCode}</Text> · engine {r.engineVersion}
                  {note ? ` (${note})` : ''}
                </Text>
              ) : null}
            </View>
          );
        })}
      </Page>
    </Document>
  );
}
