import { Anchor, Grid, Group, Stack } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ListLoadFailed } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { useBusinessProfile } from '../api/business-profile';
import { LogoUpload } from '../components/logo-upload';
import { ProfileForm } from '../components/profile-form';

/** What every invoice says about the business: name, address, contact, tax ID, logo, terms and reminders. */
export function BusinessProfileRoute() {
  const profile = useBusinessProfile();
  return (
    <Stack gap="md" maw={1200}>
      <Anchor component={Link} to={paths.invoices.list.getHref()} size="sm" w="fit-content">
        <Group gap={4} mih={44}>
          <IconArrowLeft size={18} aria-hidden="true" />
          Invoices
        </Group>
      </Anchor>
      <PageHeader
        title="Business profile"
        description="The header, footer and terms of every invoice, and when unpaid invoices get reminders."
      />
      {profile.isPending ? <PageLoader label="Loading the business profile" /> : null}
      {profile.isError ? (
        <ListLoadFailed
          title="The business profile could not be loaded"
          message={profile.error.message}
          onRetry={() => void profile.refetch()}
        />
      ) : null}
      {profile.data ? (
        <Grid gap="md">
          <Grid.Col span={{ base: 12, md: 8 }}>
            <ProfileForm profile={profile.data} />
          </Grid.Col>
          <Grid.Col span={{ base: 12, md: 4 }}>
            <LogoUpload logoUrl={profile.data.logoUrl} />
          </Grid.Col>
        </Grid>
      ) : null}
    </Stack>
  );
}
