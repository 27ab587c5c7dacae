import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { ChoiceRow } from '../../../components/ui/ChoiceRow';
import { Notice } from '../../../components/ui/Notice';
import { ReviewQueue } from '../../../components/review/ReviewQueue';
import { ReviewDetail } from '../../../components/review/ReviewDetail';
import { useWideLayout } from '../../../hooks/useWideLayout';
import { useTheme } from '../../../hooks/useTheme';

export default function ReviewRoute() {
  const wide = useWideLayout();
  const t = useTheme();
  const router = useRouter();
  const [status, setStatus] = useState('pending');
  const [selected, setSelected] = useState<string | null>(null);
  const filter = (
    <ChoiceRow
      label="Show"
      value={status}
      onChange={setStatus}
      options={[{ value: 'pending', text: 'waiting' }, { value: 'approved', text: 'approved' }, { value: 'rejected', text: 'rejected' }, { value: 'changes_requested', text: 'sent back' }, { value: 'all', text: 'all' }]}
    />
  );
  if (!wide) {
    return (
      <Screen title="Review" subtitle="Submissions waiting for a curator">
        {filter}
        <ReviewQueue status={status} selectedId={null} onOpen={(s) => router.push(`/review/${s.id}`)} />
      </Screen>
    );
  }
  return (
    <Screen title="Review" subtitle="Submissions waiting for a curator" scroll={false}>
      <View style={styles.panes}>
        <ScrollView style={styles.list} contentContainerStyle={styles.gap}>
          {filter}
          <ReviewQueue status={status} selectedId={selected} onOpen={(s) => setSelected(s.id)} />
        </ScrollView>
        <ScrollView style={[styles.detail, { borderLeftColor: t.colours.border }]} contentContainerStyle={styles.detailBody}>
          {selected ? <ReviewDetail key={selected} id={selected} /> : <Notice text="Choose a submission from the queue." />}
        </ScrollView>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { flex: 1, flexDirection: 'row', gap: 16, minHeight: 0 },
  list: { width: 360, flexGrow: 0 },
  gap: { gap: 10, paddingBottom: 24 },
  detail: { flex: 1, borderLeftWidth: 1 },
  detailBody: { paddingLeft: 16, paddingBottom: 24 },
});
