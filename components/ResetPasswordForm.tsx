import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { PasswordResetConfirmBodySchema, PasswordResetRequestBodySchema, type PasswordResetConfirmBody, type PasswordResetRequestBody } from '../shared/api/auth';
import { apiRequest } from '../client/api';
import { describeError } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { TextField } from './ui/TextField';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';

/** Ask for a reset code by e-mail, then set a new password with it. */
export function ResetPasswordForm({ token }: { token?: string }) {
  const t = useTheme();
  const [asked, setAsked] = useState(false);
  const [done, setDone] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const ask = useForm<PasswordResetRequestBody>({ resolver: zodResolver(PasswordResetRequestBodySchema), defaultValues: { email: '' } });
  const confirm = useForm<PasswordResetConfirmBody>({ resolver: zodResolver(PasswordResetConfirmBodySchema), defaultValues: { token: token ?? '', password: '' } });
  const card = [styles.card, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.lg }];

  const sendAsk = ask.handleSubmit(async (body) => {
    setFailure(null);
    try {
      await apiRequest('/api/auth/password-reset', { method: 'POST', body });
      setAsked(true);
    } catch (err) {
      setFailure(describeError(err));
    }
  });
  const sendConfirm = confirm.handleSubmit(async (body) => {
    setFailure(null);
    try {
      await apiRequest('/api/auth/password-reset/confirm', { method: 'POST', body });
      setDone(true);
    } catch (err) {
      setFailure(describeError(err));
    }
  });

  return (
    <View style={styles.wrap}>
      {!token ? (
        <View style={card}>
          <Controller
            control={ask.control}
            name="email"
            render={({ field, fieldState }) => <TextField label="E-mail of the account" autoCapitalize="none" keyboardType="email-address" value={field.value} onChangeText={field.onChange} error={fieldState.error?.message} />}
          />
          <Button label="Send a reset code" busy={ask.formState.isSubmitting} onPress={sendAsk} />
          {asked ? <Notice text="If the address has an account, a message with a reset code is on its way." /> : null}
        </View>
      ) : null}
      <View style={card}>
        <Controller
          control={confirm.control}
          name="token"
          render={({ field, fieldState }) => <TextField label="Reset code" autoCapitalize="none" value={field.value} onChangeText={field.onChange} error={fieldState.error?.message} />}
        />
        <Controller
          control={confirm.control}
          name="password"
          render={({ field, fieldState }) => <TextField label="New password (at least 10 characters)" secureTextEntry value={field.value} onChangeText={field.onChange} error={fieldState.error?.message} />}
        />
        <Button label="Set the new password" busy={confirm.formState.isSubmitting} onPress={sendConfirm} />
        {done ? <Text style={{ color: t.colours.positive, fontFamily: t.fonts.medium }}>Password changed; sign in with it now.</Text> : null}
      </View>
      {failure ? <Notice tone="danger" text={failure} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 14, width: '100%', maxWidth: 420, alignSelf: 'center' },
  card: { gap: 14, padding: 20, borderWidth: 1 },
});
