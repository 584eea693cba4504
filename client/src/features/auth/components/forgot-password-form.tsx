import { Alert, Anchor, Button, Stack, Text, TextInput } from '@mantine/core';
import { isEmail, useForm } from '@mantine/form';
import { IconMailForward } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { showFieldErrors } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm({ initialEmail = '' }: { initialEmail?: string }) {
  const request = useRequestPasswordReset();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { email: initialEmail },
    validate: { email: isEmail('Enter the e-mail address you sign in with.') },
  });

  if (request.isSuccess) {
    return (
      <Stack gap="md">
        <Alert color="keenTeal" icon={<IconMailForward size={20} />} title="Check your e-mail">
          {request.data.message}
        </Alert>
        <Text size="sm" c="dimmed">
          The link works once and only for a short while. Nothing arrived? Look in the spam folder, or ask again.
        </Text>
        <Anchor component={Link} to={paths.auth.signIn.getHref()}>
          Back to sign in
        </Anchor>
      </Stack>
    );
  }

  const submit = form.onSubmit((values) => {
    request.mutate({ email: values.email.trim() }, { onError: (error) => showFieldErrors(form, error) });
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="username"
          required
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <Button type="submit" loading={request.isPending}>
          Send me a link
        </Button>
        <Anchor component={Link} to={paths.auth.signIn.getHref()} size="sm">
          Back to sign in
        </Anchor>
      </Stack>
    </form>
  );
}
