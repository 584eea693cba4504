import { Stack } from '@mantine/core';
import { PageHeader } from '@/components/page-header';
import { useSession } from '@/lib/session';
import { BookingPage } from '../components/booking-page';
import { PublicFrame } from '../components/public-frame';

const DESCRIPTION =
  'Leave your shears at your stop for its next route day, or mail them in. No account needed: we e-mail you a link to change or cancel.';
const SIGNED_IN_DESCRIPTION =
  'Leave your shears at your stop for its next route day, or mail them in. We e-mail you a link to change or cancel.';

/** Signed out, the public page; signed in, the same form inside the app, filled in for a client. */
export function BookRoute() {
  const state = useSession();
  if (state.status !== 'signed-in') {
    return (
      <PublicFrame title="Book a drop-off" description={DESCRIPTION}>
        <BookingPage />
      </PublicFrame>
    );
  }
  const isClient = state.user.role === 'client';
  return (
    <Stack gap="md" maw={720}>
      <PageHeader title="Book a drop-off" description={SIGNED_IN_DESCRIPTION} />
      <BookingPage
        prefill={isClient ? { name: state.user.name, email: state.user.email } : undefined}
        withSession={isClient}
      />
    </Stack>
  );
}
