import { useMemo, useState } from 'react';
import { Text } from 'react-native';
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
export function CandidateTable({ rows, hasStandard, selectedId, onSelect }: CandidateTableProps) {
  const t = useTheme();
  const [sort, setSort] = useState<{ key: string; dir: 'asc' | 'desc' }>({ key: 'rank', dir: 'asc' });
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
            {r.amount && !r.amount.isStandard ? withUncertainty(r.amount.moleFraction, r.amount.moleFractionUncertainty) : '—'}
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
        render: (r) => withUncertainty(r.amount?.concentrationMM, r.amount?.concentrationUncertaintyMM),
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
