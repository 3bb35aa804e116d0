import type { ReactNode } from 'react';
import { Document, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import type { CopyPortRow, CopyRow, CustomerCopy } from '@/lib/builds/customer-copy';
import { PDF_FONT_FAMILY } from './fonts';
import { PDF_AUTHOR } from './sheet-document';

/**
 * The customer's copy of a build record: one page laid out as a document a shop hands
 * over (letterhead, sections, a table of ports, cautions), no navigation and no forms.
 */

const INK = '#111111';
const GREY = '#555555';
const RULE = '#999999';

const styles = StyleSheet.create({
  page: { paddingTop: 32, paddingBottom: 36, paddingHorizontal: 42, fontFamily: PDF_FONT_FAMILY.ui, fontSize: 9, color: INK, lineHeight: 1.3 },
  letterhead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end', borderBottomWidth: 1.5, borderBottomColor: INK, paddingBottom: 6, marginBottom: 10 },
  shop: { fontSize: 18, fontWeight: 700, lineHeight: 1.15 },
  title: { fontSize: 11, color: GREY, marginTop: 3 },
  reference: { fontSize: 8.5, color: GREY, textAlign: 'right' },
  columns: { flexDirection: 'row', gap: 16 },
  column: { flex: 1 },
  section: { marginBottom: 7 },
  heading: { fontSize: 10, fontWeight: 700, borderBottomWidth: 0.5, borderBottomColor: RULE, paddingBottom: 2, marginBottom: 4 },
  row: { flexDirection: 'row', marginBottom: 1.5 },
  label: { width: 110, color: GREY },
  value: { flex: 1 },
  table: { borderTopWidth: 0.5, borderTopColor: RULE },
  tableRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 1 },
  th: { fontWeight: 700, fontSize: 8 },
  cell: { fontFamily: PDF_FONT_FAMILY.condensed, fontSize: 8.5 },
  grid: { flexDirection: 'row', flexWrap: 'wrap' },
  gridCell: { width: '25%', paddingRight: 6 },
  gridLabel: { width: 78, color: GREY },
  small: { fontSize: 8, color: GREY, marginTop: 3 },
  notes: { fontSize: 9 },
  caution: { flexDirection: 'row', marginBottom: 1, fontSize: 8.5 },
  bullet: { width: 10 },
  footer: { position: 'absolute', bottom: 20, left: 42, right: 42, fontSize: 7.5, color: GREY, flexDirection: 'row', justifyContent: 'space-between' },
});

const PORT_COLUMNS: Array<{ key: keyof CopyPortRow; title: string; width: number }> = [
  { key: 'name', title: 'Port', width: 1.4 },
  { key: 'heightMm', title: 'Edge depth', width: 1.1 },
  { key: 'opens', title: 'Opens', width: 1.1 },
  { key: 'closes', title: 'Closes', width: 1.1 },
  { key: 'duration', title: 'Duration', width: 0.9 },
  { key: 'target', title: 'Target', width: 0.8 },
  { key: 'deviation', title: 'Deviation', width: 0.8 },
  { key: 'verdict', title: 'Tolerance', width: 0.8 },
];

function Rows({ rows }: { rows: CopyRow[] }) {
  return rows.map((row, i) => (
    <View key={i} style={styles.row}>
      <Text style={styles.label}>{row.label}</Text>
      <Text style={styles.value}>{row.value}</Text>
    </View>
  ));
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section} wrap={false}>
      <Text style={styles.heading}>{title}</Text>
      {children}
    </View>
  );
}

function PortTable({ copy }: { copy: CustomerCopy }) {
  if (copy.ports.length === 0) return <Text>No ports measured.</Text>;
  return (
    <View>
      <View style={styles.table}>
        <View style={styles.tableRow}>
          {PORT_COLUMNS.map((c) => (
            <Text key={c.key} style={[styles.th, { flex: c.width }]}>
              {c.title}
            </Text>
          ))}
        </View>
        {copy.ports.map((port, i) => (
          <View key={i} style={styles.tableRow}>
            {PORT_COLUMNS.map((c) => (
              <Text key={c.key} style={[styles.cell, { flex: c.width }, c.key === 'verdict' && port.verdict === 'OUTSIDE' ? { fontWeight: 700 } : {}]}>
                {port[c.key]}
              </Text>
            ))}
          </View>
        ))}
      </View>
      {copy.portNotes.map((note, i) => (
        <Text key={i} style={styles.small}>
          {note}
        </Text>
      ))}
      <Text style={styles.small}>{copy.toleranceText}</Text>
    </View>
  );
}

export function BuildRecordDocument({ copy, paper }: { copy: CustomerCopy; paper: 'A4' | 'LETTER' }) {
  return (
    <Document title={`${copy.shopName} — ${copy.title}`} author={copy.shopName} subject={copy.title} creator={PDF_AUTHOR} producer={PDF_AUTHOR}>
      <Page size={paper} style={styles.page}>
        <View style={styles.letterhead}>
          <View>
            <Text style={styles.shop}>{copy.shopName}</Text>
            <Text style={styles.title}>{copy.title}</Text>
          </View>
          <View>
            <Text style={styles.reference}>{copy.reference}</Text>
            <Text style={styles.reference}>Date {copy.date}</Text>
          </View>
        </View>
        <View style={styles.columns}>
          <View style={styles.column}>
            <Section title="Customer and engine">
              <Rows rows={copy.job} />
            </Section>
          </View>
          <View style={styles.column}>
            <Section title="Top dead centre">
              <Rows rows={copy.tdc} />
            </Section>
            <Section title="Ignition timing">
              <Rows rows={copy.timing} />
            </Section>
          </View>
        </View>
        <Section title="Port timing (crank degrees)">
          <PortTable copy={copy} />
        </Section>
        {copy.other.length > 0 && (
          <Section title="Other measurements">
            <View style={styles.grid}>
              {copy.other.map((row, i) => (
                <View key={i} style={[styles.row, styles.gridCell]}>
                  <Text style={styles.gridLabel}>{row.label}</Text>
                  <Text style={styles.value}>{row.value}</Text>
                </View>
              ))}
            </View>
          </Section>
        )}
        {copy.notes !== '' && (
          <Section title="Notes">
            <Text style={styles.notes}>{copy.notes}</Text>
          </Section>
        )}
        <Section title="Please note">
          {copy.cautions.map((caution, i) => (
            <View key={i} style={styles.caution}>
              <Text style={styles.bullet}>•</Text>
              <Text style={[styles.value, i === copy.cautions.length - 1 ? { fontWeight: 700 } : {}]}>{caution}</Text>
            </View>
          ))}
        </Section>
        <View style={styles.footer} fixed>
          <Text>{copy.shopName}</Text>
          <Text>{copy.reference}</Text>
        </View>
      </Page>
    </Document>
  );
}
