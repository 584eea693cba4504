import { Alert, Anchor, Button, Group, PasswordInput, Stack, TextInput } from '@mantine/core';
import { isEmail, isNotEmpty, useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-error';
import { showFieldErrors } from '@/lib/form-errors';
import { useLogin, type LoginInput } from '../api/login';

export function SignInForm() {
  const login = useLogin();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<LoginInput>({
    mode: 'uncontrolled',
    initialValues: { email: '', password: '' },
    validate: {
      email: isEmail('Enter your e-mail address, for example name@salon.test.'),
      password: isNotEmpty('Enter your password.'),
    },
  });

  const submit = form.onSubmit((values) => {
    setFormError(null);
    login.mutate(
      { email: values.email.trim(), password: values.password },
      {
        onError: (error) => {
          if (showFieldErrors(form, error)) return;
          if (error instanceof ApiError && error.status === 401) setFormError(error.message);
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        {formError ? (
          <Alert color="red" icon={<IconAlertCircle size={20} />} title="Not signed in">
            {formError}
          </Alert>
        ) : null}
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="username"
          required
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          autoComplete="current-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <Group justify="space-between" align="center" gap="sm">
          <Anchor component={Link} to={paths.auth.forgotPassword.getHref()} size="sm">
            Forgot your password?
          </Anchor>
          <Button type="submit" loading={login.isPending}>
            Sign in
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
