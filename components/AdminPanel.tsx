import { StyleSheet, Text, View } from 'react-native';
import { RoleSchema, type Role } from '../shared/user';
import { describeError } from '../client/describeError';
import { useAdminUsersQuery, useMailOutboxQuery, usePatchUserMutation } from '../queries/admin';
import { useTheme } from '../hooks/useTheme';
import { useSession } from './providers/SessionProvider';
import { ChoiceRow } from './ui/ChoiceRow';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';
import { formatWhen } from './SyncLine';

/** Accounts and roles, and the e-mail the server "sent" (the local outbox of the mail fake). */
export function AdminPanel() {
  const t = useTheme();
  const { session } = useSession();
  const users = useAdminUsersQuery();
  const mail = useMailOutboxQuery();
  const patch = usePatchUserMutation();
  const head = [styles.head, { color: t.colours.text, fontFamily: t.fonts.semibold }];
  const small = [styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }];
  return (
    <View style={styles.wrap}>
      <Text accessibilityRole="header" style={head}>
        Accounts
      </Text>
      {users.isError ? <Notice tone="caution" text={describeError(users.error)} /> : null}
      {patch.isError ? <Notice tone="danger" text={describeError(patch.error)} /> : null}
      <View accessibilityLabel="Accounts" style={styles.list}>
        {(users.data?.users ?? []).map((u) => (
          <View key={u.id} style={[styles.card, { borderColor: t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
            <Text style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
              {u.displayName} {u.disabled ? '(disabled)' : ''}
            </Text>
            <Text style={small}>
              {u.email}
              {u.demo ? ' · demo account' : ''} · since {formatWhen(u.createdAt)}
            </Text>
            <ChoiceRow
              label={`Role of ${u.email}`}
              value={u.role}
              onChange={(role) => patch.mutate({ id: u.id, body: { role: role as Role } })}
              options={RoleSchema.options.map((r) => ({ value: r, text: r }))}
            />
            {u.id !== session?.user.id ? (
              <Button
                variant="quiet"
                label={u.disabled ? 'Enable' : 'Disable'}
                accessibleName={`${u.disabled ? 'Enable' : 'Disable'} ${u.email}`}
                onPress={() => patch.mutate({ id: u.id, body: { disabled: !u.disabled } })}
              />
            ) : null}
          </View>
        ))}
      </View>
      <Text accessibilityRole="header" style={head}>
        E-mail outbox
      </Text>
      <Text style={small}>Messages the server sent (development and tests keep them here instead of sending).</Text>
      {mail.isError ? <Notice tone="caution" text={describeError(mail.error)} /> : null}
      <View accessibilityLabel="E-mail outbox" style={styles.list}>
        {(mail.data?.messages ?? []).map((m) => (
          <View key={m.id} style={[styles.card, { borderColor: t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
            <Text style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>{m.subject}</Text>
            <Text style={small}>
              to {m.to} · {m.kind.replace('_', ' ')} · {m.status} · {formatWhen(m.createdAt)}
            </Text>
            {m.text ? <Text style={[styles.small, { color: t.colours.text, fontFamily: t.fonts.regular }]}>{m.text}</Text> : null}
          </View>
        ))}
        {mail.data && mail.data.messages.length === 0 ? <Notice text="No messages yet." /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12 },
  head: { fontSize: 18 },
  list: { gap: 8 },
  card: { borderWidth: 1, padding: 12, gap: 6 },
  name: { fontSize: 15 },
  small: { fontSize: 12, lineHeight: 17 },
});
