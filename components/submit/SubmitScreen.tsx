import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useLibraryQuery, libraryFuse } from '../../queries/library';
import { useSubmitEntryMutation } from '../../queries/outbox';
import { useSync } from '../providers/SyncProvider';
import { useSession } from '../providers/SessionProvider';
import { roleCanSubmit } from '../../client/sync';
import { describeError } from '../../client/describeError';
import { ChoiceRow } from '../ui/ChoiceRow';
import { TextField } from '../ui/TextField';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { SubmitForm } from './SubmitForm';
import { UploadForm } from './UploadForm';
import { entryToValues, type SubmitValues } from './submitValues';

type Mode = 'new' | 'change' | 'file';

/** New entry, change of an existing one, or a file; everything lands in the outbox first. */
export function SubmitScreen() {
  const { session } = useSession();
  const sync = useSync();
  const library = useLibraryQuery();
  const entries = useMemo(() => library.data ?? [], [library.data]);
  const fuse = useMemo(() => libraryFuse(entries), [entries]);
  const [mode, setMode] = useState<Mode>('new');
  const [find, setFind] = useState('');
  const [base, setBase] = useState<SubmitValues | null>(null);
  const save = useSubmitEntryMutation(() => void sync.syncNow());

  if (session && !roleCanSubmit(session.user.role)) {
    return <Notice tone="caution" text="Admin accounts manage people; submit entries from a student, analyst or curator account." />;
  }
  const matches = find.trim() ? fuse.search(find.trim(), { limit: 6 }).map((r) => r.item) : [];
  return (
    <View style={styles.wrap}>
      <ChoiceRow
        label="Submit"
        value={mode}
        onChange={(v) => {
          setMode(v as Mode);
          setBase(null);
        }}
        options={[{ value: 'new', text: 'a new entry' }, { value: 'change', text: 'a change to an entry' }, { value: 'file', text: 'a file' }]}
      />
      {mode === 'change' && !base ? (
        <View style={styles.wrap}>
          <TextField label="Entry to change" placeholder="search by name or formula" value={find} onChangeText={setFind} />
          {matches.map((e) => (
            <Button key={e.id} variant="quiet" label={`${e.name} · ${e.solvent}`} accessibleName={`Change ${e.name} in ${e.solvent}`} onPress={() => setBase(entryToValues(e))} />
          ))}
        </View>
      ) : null}
      {mode === 'new' ? <SubmitForm key="new" library={entries} busy={save.isPending} onSubmit={(body, title) => save.mutateAsync({ kind: 'submission', body, title })} /> : null}
      {mode === 'change' && base ? (
        <SubmitForm key={base.id} library={entries} initial={base} busy={save.isPending} onSubmit={(body, title) => save.mutateAsync({ kind: 'submission', body, title })} />
      ) : null}
      {mode === 'file' ? <UploadForm busy={save.isPending} onSubmit={(body, title) => save.mutateAsync({ kind: 'upload', body, title })} /> : null}
      {save.isError ? <Notice tone="danger" text={describeError(save.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12 },
});
