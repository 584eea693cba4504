import { Button, PasswordInput, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@keenroute/shared';
import { ApiError } from '@/lib/api-error';
import { showFieldErrors } from '@/lib/form-errors';
import { useSetPassword } from '../api/set-password';

interface SetPasswordFormProps {
  token: string;
  email: string;
  onDone: () => void;
  onLinkExpired: () => void;
}

export function SetPasswordForm({ token, email, onDone, onLinkExpired }: SetPasswordFormProps) {
  const setPassword = useSetPassword();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { password: '', confirm: '' },
    validate: {
      password: (value) => {
        if (value.length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
        if (value.length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
        return null;
      },
      confirm: (value, values) => (value === values.password ? null : 'The two passwords do not match.'),
    },
  });

  const submit = form.onSubmit((values) => {
    setPassword.mutate(
      { token, password: values.password },
      {
        onSuccess: onDone,
        onError: (error) => {
          if (showFieldErrors(form, error)) return;
          if (error instanceof ApiError && error.status === 404) onLinkExpired();
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        {/* Lets a password manager file the new password under the right account. */}
        <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
        <PasswordInput
          label="New password"
          description={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one that is easy to remember.`}
          autoComplete="new-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <PasswordInput
          label="The same password again"
          autoComplete="new-password"
          required
          key={form.key('confirm')}
          {...form.getInputProps('confirm')}
        />
        <Button type="submit" loading={setPassword.isPending}>
          Set password and sign in
        </Button>
      </Stack>
    </form>
  );
}
