import { useForm, Controller } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { View, StyleSheet } from 'react-native';
import { Button } from '../ui/Button';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';

export const signInSchema = z.object({
  email: z.email('Enter the e-mail address of your account.'),
  password: z.string().min(1, 'Enter your password.'),
});
export type SignInValues = z.infer<typeof signInSchema>;

export function SignInForm({ onSubmit, busy }: { onSubmit: (values: SignInValues) => void; busy: boolean }) {
  const { control, handleSubmit, formState } = useForm<SignInValues>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="email"
        render={({ field }) => (
          <TextField
            label="E-mail"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            autoCapitalize="none"
            autoComplete="email"
            keyboardType="email-address"
            inputMode="email"
            error={formState.errors.email?.message}
            testID="sign-in-email"
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        render={({ field }) => (
          <TextField
            label="Password"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            secureTextEntry
            autoComplete="current-password"
            onSubmitEditing={handleSubmit(onSubmit)}
            error={formState.errors.password?.message}
            testID="sign-in-password"
          />
        )}
      />
      <Button label="Sign in" onPress={handleSubmit(onSubmit)} busy={busy} testID="sign-in-submit" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
