import { AppShell, Burger, Group, ScrollArea, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { Link, Outlet } from 'react-router-dom';
import { Brand } from '@/components/brand';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/lib/session';
import { MainNav } from './main-nav';
import { SignedInAs, SignOutButton, UserCard } from './user-menu';

export function AppLayout() {
  const user = useSignedInUser();
  const [navOpened, { toggle, close }] = useDisclosure(false);

  return (
    <AppShell
      header={{ height: 64 }}
      navbar={{ width: 264, breakpoint: 'sm', collapsed: { mobile: !navOpened } }}
      padding={{ base: 'sm', sm: 'lg' }}
    >
      <AppShell.Header>
        <Group h="100%" px={{ base: 'sm', sm: 'lg' }} justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger
              opened={navOpened}
              onClick={toggle}
              hiddenFrom="sm"
              size="md"
              aria-label={navOpened ? 'Close navigation' : 'Open navigation'}
            />
            <UnstyledButton component={Link} to={paths.home.getHref()} aria-label="Keenroute home" onClick={close}>
              <Brand />
            </UnstyledButton>
          </Group>
          <Group gap="md" wrap="nowrap">
            <Group visibleFrom="sm">
              <SignedInAs user={user} />
            </Group>
            <SignOutButton compact />
          </Group>
        </Group>
      </AppShell.Header>

      <AppShell.Navbar p="sm">
        <AppShell.Section grow component={ScrollArea}>
          <MainNav role={user.role} onNavigate={close} />
        </AppShell.Section>
        <AppShell.Section hiddenFrom="sm" pt="sm" style={{ borderTop: '1px solid var(--mantine-color-gray-2)' }}>
          <UserCard user={user} />
        </AppShell.Section>
      </AppShell.Navbar>

      <AppShell.Main>
        <Outlet />
      </AppShell.Main>
    </AppShell>
  );
}
