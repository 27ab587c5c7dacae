import type React from 'react';
import { FlatList, Pressable, StyleSheet, Text, View } from 'react-native';
import type { LibraryEntry } from '../shared/libraryEntry';
import { useTheme } from '../hooks/useTheme';

export interface LibraryListProps {
  entries: LibraryEntry[];
  onOpen?(entry: LibraryEntry): void;
  selectedId?: string | null;
  header?: React.ReactElement;
}

export const CATEGORY_LABEL: Record<LibraryEntry['category'], string> = {
  demo: 'demo (invented)',
  contaminant: 'solvent / impurity',
  reference: 'reference',
  user: 'submitted',
};

function nucleiSummary(entry: LibraryEntry): string {
  const h = entry.signals.filter((s) => s.nucleus === '1H').length;
  const c = entry.signals.filter((s) => s.nucleus === '13C').length;
  return [h ? `${h} ¹H` : null, c ? `${c} ¹³C` : null].filter(Boolean).join(' · ');
}

/** The library as rows: name, formula, solvent, category, signal counts. */
export function LibraryList({ entries, onOpen, selectedId, header }: LibraryListProps) {
  const t = useTheme();
  return (
    <FlatList
      data={entries}
      keyExtractor={(e) => e.id}
      accessibilityLabel="Library entries"
      ListHeaderComponent={header}
      contentContainerStyle={styles.list}
      renderItem={({ item }) => (
        <Pressable
          accessibilityRole="button"
          accessibilityLabel={`Entry ${item.name}`}
          onPress={onOpen ? () => onOpen(item) : undefined}
          style={[
            styles.row,
            { backgroundColor: item.id === selectedId ? t.colours.surfaceAlt : t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.md },
          ]}
        >
          <View style={styles.main}>
            <Text numberOfLines={2} style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
              {item.name}
            </Text>
            <Text numberOfLines={1} style={[styles.meta, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
              {item.formula} · {item.solvent} · {nucleiSummary(item)}
            </Text>
          </View>
          <Text style={[styles.tag, { color: item.category === 'demo' ? t.colours.caution : t.colours.textMuted, fontFamily: t.fonts.medium }]}>
            {CATEGORY_LABEL[item.category]}
          </Text>
        </Pressable>
      )}
    />
  );
}

const styles = StyleSheet.create({
  list: { gap: 8, paddingBottom: 24 },
  row: { flexDirection: 'row', alignItems: 'center', gap: 10, paddingHorizontal: 14, paddingVertical: 10, borderWidth: 1 },
  main: { flex: 1, minWidth: 0, gap: 2 },
  name: { fontSize: 16 },
  meta: { fontSize: 13 },
  tag: { fontSize: 12, flexShrink: 0, maxWidth: 110, textAlign: 'right' },
});
