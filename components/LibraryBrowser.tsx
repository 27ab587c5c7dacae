import { useMemo, useState } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { LibraryEntry } from '../shared/libraryEntry';
import { SolventSchema } from '../shared/solvent';
import { libraryFilter, libraryFuse, useLibraryQuery, type LibraryFilter } from '../queries/library';
import { describeError } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { useWideLayout } from '../hooks/useWideLayout';
import { LibraryList } from './LibraryList';
import { EntryDetail } from './EntryDetail';
import { SyncLine } from './SyncLine';
import { Notice } from './ui/Notice';
import { TextField } from './ui/TextField';
import { ChoiceRow } from './ui/ChoiceRow';

const ANY = 'any';

/** The library screen body: search and filters over the device copy; two panes on wide screens. */
export function LibraryBrowser() {
  const t = useTheme();
  const wide = useWideLayout();
  const router = useRouter();
  const local = useLibraryQuery();
  const entries = useMemo(() => local.data ?? [], [local.data]);
  const fuse = useMemo(() => libraryFuse(entries), [entries]);
  const [text, setText] = useState('');
  const [nucleus, setNucleus] = useState<string>(ANY);
  const [solvent, setSolvent] = useState<string>(ANY);
  const [category, setCategory] = useState<string>(ANY);
  const [selected, setSelected] = useState<string | null>(null);

  const filter: LibraryFilter = {
    text,
    nucleus: nucleus === ANY ? null : (nucleus as LibraryFilter['nucleus']),
    solvent: solvent === ANY ? null : solvent,
    category: category === ANY ? null : (category as LibraryFilter['category']),
  };
  const shown = useMemo(() => libraryFilter(entries, fuse, filter), [entries, fuse, filter.text, filter.nucleus, filter.solvent, filter.category]); // eslint-disable-line react-hooks/exhaustive-deps
  const solventsPresent = SolventSchema.options.filter((s) => entries.some((e) => e.solvent === s));
  const current = wide ? (entries.find((e) => e.id === selected) ?? shown[0] ?? null) : null;

  const open = (e: LibraryEntry) => {
    if (wide) setSelected(e.id);
    else router.push(`/library/${encodeURIComponent(e.id)}`);
  };

  const controls = (
    <View style={styles.controls}>
      <SyncLine />
      <TextField label="Search the library" placeholder="name, synonym or formula" value={text} onChangeText={setText} autoCapitalize="none" />
      <ChoiceRow label="Nucleus" value={nucleus} onChange={setNucleus} options={[{ value: ANY, text: 'any' }, { value: '1H', text: '¹H' }, { value: '13C', text: '¹³C' }]} />
      <ChoiceRow label="Solvent" value={solvent} onChange={setSolvent} options={[{ value: ANY, text: 'any' }, ...solventsPresent.map((s) => ({ value: s, text: s }))]} />
      <ChoiceRow
        label="Category"
        value={category}
        onChange={setCategory}
        options={[
          { value: ANY, text: 'any' },
          { value: 'demo', text: 'demo' },
          { value: 'contaminant', text: 'solvent / impurity' },
          { value: 'reference', text: 'reference' },
          { value: 'user', text: 'submitted' },
        ]}
      />
      <Text accessibilityLabel="Entries on this device" style={[styles.count, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        {local.isLoading ? 'Reading the library on this device…' : `${entries.length} entries on this device`}
        {!local.isLoading && shown.length !== entries.length ? ` · ${shown.length} shown` : ''}
      </Text>
      {local.isError ? <Notice tone="danger" text={describeError(local.error)} /> : null}
    </View>
  );

  if (!wide) {
    return (
      <View style={styles.wrap}>
        <LibraryList entries={shown} onOpen={open} header={controls} />
      </View>
    );
  }
  return (
    <View style={styles.panes}>
      <View style={styles.listPane}>
        <LibraryList entries={shown} onOpen={open} selectedId={current?.id ?? null} header={controls} />
      </View>
      <ScrollView style={[styles.detailPane, { borderLeftColor: t.colours.border }]} contentContainerStyle={styles.detailBody}>
        {current ? <EntryDetail entry={current} /> : <Notice text="No entry matches the search." />}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flex: 1, minHeight: 0 },
  controls: { gap: 10, paddingBottom: 6 },
  count: { fontSize: 14 },
  panes: { flex: 1, flexDirection: 'row', gap: 16, minHeight: 0 },
  listPane: { width: 400, minHeight: 0 },
  detailPane: { flex: 1, borderLeftWidth: 1, minWidth: 0 },
  detailBody: { paddingLeft: 16, paddingBottom: 24 },
});
