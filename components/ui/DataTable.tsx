import type { ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface Column<R> {
  key: string;
  title: string;
  /** Relative width (flex); tables scroll sideways when their minimum width exceeds the screen. */
  flex?: number;
  minWidth?: number;
  align?: 'left' | 'right';
  render(row: R): ReactNode;
  sortValue?(row: R): number | string;
}

export interface DataTableProps<R> {
  label: string;
  columns: Column<R>[];
  rows: R[];
  rowKey(row: R): string;
  sort?: { key: string; dir: 'asc' | 'desc' } | null;
  onSort?(key: string): void;
  onRowPress?(row: R): void;
  rowLabel?(row: R): string;
  selectedKey?: string | null;
}

/** A plain table: header (sortable where a column says how), rows, horizontal scroll inside itself. */
export function DataTable<R>({ label, columns, rows, rowKey, sort, onSort, onRowPress, rowLabel, selectedKey }: DataTableProps<R>) {
  const t = useTheme();
  const minWidth = columns.reduce((s, c) => s + (c.minWidth ?? 60), 0);
  const cell = (c: Column<R>, child: ReactNode, head = false) => (
    <View key={c.key} style={[styles.cell, { flex: c.flex ?? 1, minWidth: c.minWidth ?? 60, alignItems: c.align === 'right' ? 'flex-end' : 'flex-start' }]}>
      {typeof child === 'string' || typeof child === 'number' ? (
        <Text style={[styles.text, { color: head ? t.colours.textMuted : t.colours.text, fontFamily: head ? t.fonts.semibold : t.fonts.regular }]}>{child}</Text>
      ) : (
        child
      )}
    </View>
  );
  return (
    <ScrollView horizontal style={styles.scroll} contentContainerStyle={{ minWidth: '100%' }}>
      <View role="table" accessibilityLabel={label} style={[styles.table, { minWidth, borderColor: t.colours.border, borderRadius: t.radius.md, backgroundColor: t.colours.surface }]}>
        <View role="row" style={[styles.row, { borderBottomColor: t.colours.border, backgroundColor: t.colours.surfaceAlt }]}>
          {columns.map((c) =>
            c.sortValue && onSort ? (
              <Pressable
                key={c.key}
                accessibilityRole="button"
                accessibilityLabel={`Sort by ${c.title}`}
                onPress={() => onSort(c.key)}
                style={[styles.cell, { flex: c.flex ?? 1, minWidth: c.minWidth ?? 60, alignItems: c.align === 'right' ? 'flex-end' : 'flex-start' }]}
              >
                <Text style={[styles.text, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
                  {c.title}
                  {sort?.key === c.key ? (sort.dir === 'asc' ? ' ▲' : ' ▼') : ''}
                </Text>
              </Pressable>
            ) : (
              cell(c, c.title, true)
            ),
          )}
        </View>
        {rows.map((r) => {
          const k = rowKey(r);
          const body = columns.map((c) => cell(c, c.render(r)));
          const style = [styles.row, { borderBottomColor: t.colours.border }, k === selectedKey && { backgroundColor: t.colours.surfaceAlt }];
          return onRowPress ? (
            <Pressable key={k} accessibilityRole="button" accessibilityLabel={rowLabel?.(r)} onPress={() => onRowPress(r)} style={style}>
              {body}
            </Pressable>
          ) : (
            <View key={k} role="row" accessibilityLabel={rowLabel?.(r)} style={style}>
              {body}
            </View>
          );
        })}
      </View>
    </ScrollView>
  );
}

/** Sort rows by a column's sortValue. */
export function sortRows<R>(rows: R[], columns: Column<R>[], sort: { key: string; dir: 'asc' | 'desc' } | null): R[] {
  const col = sort && columns.find((c) => c.key === sort.key);
  if (!col?.sortValue || !sort) return rows;
  const f = col.sortValue;
  const sign = sort.dir === 'asc' ? 1 : -1;
  return rows.slice().sort((a, b) => {
    const x = f(a);
    const y = f(b);
    return (x < y ? -1 : x > y ? 1 : 0) * sign;
  });
}

const styles = StyleSheet.create({
  scroll: { width: '100%', flexGrow: 0 },
  table: { borderWidth: 1, overflow: 'hidden', width: '100%' },
  row: { flexDirection: 'row', borderBottomWidth: StyleSheet.hairlineWidth, alignItems: 'center' },
  cell: { paddingHorizontal: 8, paddingVertical: 7, justifyContent: 'center' },
  text: { fontSize: 13 },
});
