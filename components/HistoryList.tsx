import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import { useAnalysisListQuery } from '../queries/analyses';
import { useTheme } from '../hooks/useTheme';
import { Notice } from './ui/Notice';

/** Past analyses on this device, newest first; each opens from the local database. */
export function HistoryList() {
  const t = useTheme();
  const router = useRouter();
  const list = useAnalysisListQuery();
  if (list.isLoading) return <Notice text="Reading the history on this device…" />;
  const items = list.data ?? [];
  if (items.length === 0) return <Notice text="No analyses yet. Run one on the Analyse screen; it is kept here." />;
  return (
    <View accessibilityLabel="Past analyses" style={styles.list}>
      <Text style={[styles.count, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{items.length} analyses on this device</Text>
      {items.map((a) => (
        <Pressable
          key={a.id}
          accessibilityRole="button"
          accessibilityLabel={`Open analysis ${a.name}`}
          onPress={() => router.push(`/analyse/${a.id}`)}
          style={[styles.row, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.md }]}
        >
          <View style={styles.main}>
            <Text numberOfLines={1} style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
              {a.name}
            </Text>
            <Text numberOfLines={2} style={[styles.meta, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
              {new Date(a.createdAt).toLocaleString()} · {a.nucleus} · {a.summary}
            </Text>
          </View>
          {a.demo ? <Text style={[styles.tag, { color: t.colours.caution, fontFamily: t.fonts.medium }]}>demo</Text> : null}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 8 },
  count: { fontSize: 13 },
  row: { flexDirection: 'row', alignItems: 'center', gap: 10, paddingHorizontal: 14, paddingVertical: 10, borderWidth: 1 },
  main: { flex: 1, minWidth: 0, gap: 2 },
  name: { fontSize: 15 },
  meta: { fontSize: 12 },
  tag: { fontSize: 12 },
});
