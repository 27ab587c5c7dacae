import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { SignInBodySchema, type SignInBody } from '../shared/api/auth';
import { describeError } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';
import { TextField } from './ui/TextField';

export interface SignInFormProps {
  onSubmit(body: SignInBody): Promise<void>;
}

export function SignInForm({ onSubmit }: SignInFormProps) {
  const t = useTheme();
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, formState } = useForm<SignInBody>({
    resolver: zodResolver(SignInBodySchema),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit(async (body) => {
    setFailure(null);
    try {
      await onSubmit(body);
    } catch (err) {
      setFailure(describeError(err));
    }
  });

  return (
    <View style={[styles.card, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.lg }]}>
      <Controller
        control={control}
        name="email"
        render={({ field, fieldState }) => (
          <TextField
            label="E-mail"
            autoCapitalize="none"
            autoComplete="email"
            keyboardType="email-address"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        render={({ field, fieldState }) => (
          <TextField
            label="Password"
            secureTextEntry
            autoComplete="current-password"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            onSubmitEditing={submit}
            error={fieldState.error?.message}
          />
        )}
      />
      {failure ? <Notice tone="danger" text={failure} /> : null}
      <Button label="Sign in" onPress={submit} busy={formState.isSubmitting} />
      <Text style={[styles.hint, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        Demo accounts: student, analyst, curator or admin @demo.tessera.test, password tessera-demo (invented demo data).
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: 14, padding: 20, borderWidth: 1, width: '100%', maxWidth: 420, alignSelf: 'center' },
  hint: { fontSize: 13, lineHeight: 18 },
});
