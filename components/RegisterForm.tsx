import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { RegisterBodySchema, SessionResponseSchema, type RegisterBody } from '../shared/api/auth';
import { apiRequest } from '../client/api';
import { describeError } from '../client/describeError';
import { useSession } from './providers/SessionProvider';
import { useTheme } from '../hooks/useTheme';
import { TextField } from './ui/TextField';
import { ChoiceRow } from './ui/ChoiceRow';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';

/** A new student or analyst account; curator and admin roles are given by an admin. */
export function RegisterForm() {
  const t = useTheme();
  const { update } = useSession();
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, formState } = useForm<RegisterBody>({
    resolver: zodResolver(RegisterBodySchema) as never,
    defaultValues: { email: '', password: '', displayName: '', role: 'student' },
  });
  const submit = handleSubmit(async (body) => {
    setFailure(null);
    try {
      await update(SessionResponseSchema.parse(await apiRequest<unknown>('/api/auth/register', { method: 'POST', body })));
    } catch (err) {
      setFailure(describeError(err));
    }
  });
  const text = (name: 'email' | 'password' | 'displayName', label: string, extra: object = {}) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => <TextField label={label} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} {...extra} />}
    />
  );
  return (
    <View style={[styles.card, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.lg }]}>
      {text('displayName', 'Your name')}
      {text('email', 'E-mail', { autoCapitalize: 'none', keyboardType: 'email-address', autoComplete: 'email' })}
      {text('password', 'Password (at least 10 characters)', { secureTextEntry: true, autoComplete: 'new-password' })}
      <Controller
        control={control}
        name="role"
        render={({ field }) => <ChoiceRow label="I am a" value={field.value} onChange={field.onChange} options={[{ value: 'student', text: 'student' }, { value: 'analyst', text: 'analyst' }]} />}
      />
      {failure ? <Notice tone="danger" text={failure} /> : null}
      <Button label="Create the account" busy={formState.isSubmitting} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: 14, padding: 20, borderWidth: 1, width: '100%', maxWidth: 420, alignSelf: 'center' },
});
