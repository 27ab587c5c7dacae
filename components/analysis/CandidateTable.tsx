import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useWideLayout } from '../../hooks/useWideLayout';
import { ChoiceRow } from '../ui/ChoiceRow';
import { useTheme } from '../../hooks/useTheme';
import { DataTable, sortRows, type Column } from '../ui/DataTable';
import { fmt, statusText, withUncertainty, type CandidateRow } from '../../client/analysisRows';

export interface CandidateTableProps {
  rows: CandidateRow[];
  hasStandard: boolean;
  selectedId: string | null;
  onSelect(row: CandidateRow): void;
}

/** The ranked candidates; every numeric column sorts. */
/** Standards and shift references are fitted but not counted among the mixture's compounds. */
function amountText(r: CandidateRow): string {
  if (!r.amount) return '—';
  if (r.amount.isStandard) return 'standard';
  if (r.screen.category === 'reference' && r.amount.moleFraction === 0) return 'reference';
  return withUncertainty(r.amount.moleFraction, r.amount.moleFractionUncertainty);
}

export function CandidateTable({ rows, hasStandard, selectedId, onSelect }: CandidateTableProps) {
  const t = useTheme();
  const [sort, setSort] = useState<{ key: string; dir: 'asc' | 'desc' }>({ key: 'amount', dir: 'desc' });
  const columns = useMemo<Column<CandidateRow>[]>(() => {
    const cols: Column<CandidateRow>[] = [
      { key: 'rank', title: '#', minWidth: 34, flex: 0.4, render: (r) => String(r.rank), sortValue: (r) => r.rank },
      {
        key: 'name',
        title: 'Compound',
        minWidth: 150,
        flex: 2.4,
        sortValue: (r) => r.name.toLowerCase(),
        render: (r) => (
          <Text style={{ color: r.confirmed ? t.colours.text : t.colours.textMuted, fontFamily: r.confirmed ? t.fonts.semibold : t.fonts.regular, fontSize: 13 }}>
            {r.name}
            {r.screen.contaminant ? ' · impurity' : ''}
          </Text>
        ),
      },
      { key: 'score', title: 'Score', minWidth: 56, align: 'right', render: (r) => r.screen.score.toFixed(2), sortValue: (r) => r.screen.score },
      { key: 'q', title: 'q-value', minWidth: 64, align: 'right', render: (r) => fmt(r.qValue, 2), sortValue: (r) => r.qValue ?? 2 },
      {
        key: 'amount',
        title: 'Mole fraction',
        minWidth: 118,
        align: 'right',
        sortValue: (r) => r.amount?.moleFraction ?? -1,
        render: (r) => (
          <Text accessibilityLabel={`Amount of ${r.name}`} style={{ color: t.colours.text, fontFamily: t.fonts.regular, fontSize: 13 }}>
            {amountText(r)}
          </Text>
        ),
      },
    ];
    if (hasStandard) {
      cols.push({
        key: 'conc',
        title: 'mmol/L',
        minWidth: 110,
        align: 'right',
        sortValue: (r) => r.amount?.concentrationMM ?? -1,
        render: (r) => (
          <Text accessibilityLabel={`Concentration of ${r.name}`} style={{ color: t.colours.text, fontFamily: t.fonts.regular, fontSize: 13 }}>
            {withUncertainty(r.amount?.concentrationMM, r.amount?.concentrationUncertaintyMM)}
          </Text>
        ),
      });
    }
    cols.push(
      { key: 'snr', title: 'S/N', minWidth: 50, align: 'right', render: (r) => fmt(r.amount?.snr ?? r.fit?.snr, 2), sortValue: (r) => r.amount?.snr ?? r.fit?.snr ?? -1 },
      {
        key: 'status',
        title: 'Fit',
        minWidth: 130,
        flex: 1.6,
        sortValue: (r) => (r.confirmed ? 0 : 1),
        render: (r) => (
          <Text numberOfLines={2} style={{ color: r.confirmed ? t.colours.positive : t.colours.textMuted, fontFamily: t.fonts.regular, fontSize: 12 }}>
            {statusText(r)}
          </Text>
        ),
      },
    );
    return cols;
  }, [hasStandard, t]);
  const sorted = sortRows(rows, columns, sort);
  const wide = useWideLayout();
  if (!wide) {
    // Phone: one card a candidate, so the amounts are never off-screen in a sideways table.
    return (
      <View accessibilityLabel="Candidates" style={styles.cards}>
        <ChoiceRow
          label="Sort candidates by"
          value={`${sort.key}:${sort.dir}`}
          onChange={(v) => {
            const [key, dir] = v.split(':');
            setSort({ key, dir: dir as 'asc' | 'desc' });
          }}
          options={[
            { value: 'rank:asc', text: 'rank' },
            { value: 'amount:desc', text: 'amount' },
            { value: 'q:asc', text: 'q-value' },
            { value: 'name:asc', text: 'name' },
          ]}
        />
        {sorted.map((r) => (
          <Pressable
            key={r.entryId}
            accessibilityRole="button"
            accessibilityLabel={`Candidate ${r.name}`}
            onPress={() => onSelect(r)}
            style={[styles.card, { borderColor: r.entryId === selectedId ? t.colours.accent : t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}
          >
            <Text style={{ color: r.confirmed ? t.colours.text : t.colours.textMuted, fontFamily: r.confirmed ? t.fonts.semibold : t.fonts.regular, fontSize: 15 }}>
              {r.rank}. {r.name}
              {r.screen.contaminant ? ' · impurity' : ''}
            </Text>
            <View style={styles.facts}>
              <Text style={[styles.fact, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>score {r.screen.score.toFixed(2)}</Text>
              <Text style={[styles.fact, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>q {fmt(r.qValue, 2)}</Text>
              <Text style={[styles.fact, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>S/N {fmt(r.amount?.snr ?? r.fit?.snr, 2)}</Text>
            </View>
            <Text style={[styles.fact, { color: t.colours.text, fontFamily: t.fonts.regular }]}>
              mole fraction{' '}
              <Text accessibilityLabel={`Amount of ${r.name}`} style={{ fontFamily: t.fonts.semibold }}>
                {amountText(r)}
              </Text>
              {hasStandard && r.amount?.concentrationMM != null ? ' · ' : ''}
              {hasStandard && r.amount?.concentrationMM != null ? (
                <Text accessibilityLabel={`Concentration of ${r.name}`}>{`${withUncertainty(r.amount.concentrationMM, r.amount.concentrationUncertaintyMM)} mmol/L`}</Text>
              ) : null}
            </Text>
            <Text numberOfLines={2} style={[styles.fact, { color: r.confirmed ? t.colours.positive : t.colours.textMuted, fontFamily: t.fonts.regular }]}>
              {statusText(r)}
            </Text>
          </Pressable>
        ))}
      </View>
    );
  }
  return (
    <DataTable
      label="Candidates"
      columns={columns}
      rows={sorted}
      rowKey={(r) => r.entryId}
      rowLabel={(r) => `Candidate ${r.name}`}
      sort={sort}
      onSort={(key) => setSort((s) => ({ key, dir: s.key === key && s.dir === 'asc' ? 'desc' : 'asc' }))}
      onRowPress={onSelect}
      selectedKey={selectedId}
    />
  );
}

const styles = StyleSheet.create({
  cards: { gap: 8 },
  card: { borderWidth: 1, padding: 10, gap: 3 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: 12 },
  fact: { fontSize: 13 },
});
