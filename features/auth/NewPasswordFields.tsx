// The new password typed twice: for an invited person choosing theirs and for a reset.
import { Controller, type Control, type FieldErrors, type FieldValues, type Path } from 'react-hook-form';
import { minPasswordLength, type NewPasswordValues } from '../../shared/people/password';
import { TextField } from '../ui/TextField';

export function NewPasswordFields<T extends FieldValues & NewPasswordValues>({ control, errors, onSubmit, testIDPrefix, email }: {
  control: Control<T>;
  errors: FieldErrors<T>;
  onSubmit: () => void;
  testIDPrefix: string;
  email?: string | null;
}) {
  const hint = `At least ${minPasswordLength} characters${email ? `, not containing “${email.split('@')[0]}”` : ''}. A few unrelated words are easy to remember and hard to guess.`;
  const message = (name: 'password' | 'confirm') => errors[name]?.message as string | undefined;
  return (
    <>
      <Controller
        control={control}
        name={'password' as Path<T>}
        render={({ field }) => (
          <TextField label="New password" hint={hint} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} secureTextEntry autoComplete="new-password" error={message('password')} testID={`${testIDPrefix}-password`} />
        )}
      />
      <Controller
        control={control}
        name={'confirm' as Path<T>}
        render={({ field }) => (
          <TextField label="The same password again" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} secureTextEntry autoComplete="new-password" onSubmitEditing={onSubmit} error={message('confirm')} testID={`${testIDPrefix}-confirm`} />
        )}
      />
    </>
  );
}
