import { Anchor, Card, Group, List, SimpleGrid, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { STAFF_ROLES } from '@keenroute/shared';
import { IconArrowRight, IconHourglassHigh, IconKey } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { BenchSafetyCard } from '@/components/bench-safety-card';
import { RoleBadge } from '@/components/role-badge';
import { navItemsFor } from '@/config/navigation';
import { paths } from '@/config/paths';
import { ROLE_SUMMARIES } from '@/config/roles';
import { useSignedInUser } from '@/lib/session';
import { firstName, greetingFor } from './greeting';
import { ROLE_OUTLOOK } from './role-outlook';

export function HomeRoute() {
  const user = useSignedInUser();
  const pages = navItemsFor(user.role).filter((item) => item.href !== paths.home.getHref());
  const isStaff = STAFF_ROLES.includes(user.role);

  return (
    <Stack gap="lg" maw={1100}>
      <div>
        <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
          {greetingFor(new Date())}, {firstName(user.name)}
        </Title>
        <Group gap="xs" mt="xs">
          <Text c="dimmed">Signed in as</Text>
          <RoleBadge role={user.role} />
          <Text c="dimmed">{user.email}</Text>
        </Group>
        <Text mt="sm">{ROLE_SUMMARIES[user.role]}</Text>
      </div>

      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
        <Card withBorder padding="lg" radius="lg">
          <Title order={2} fz="h3" mb="sm">
            What you can do now
          </Title>
          <Stack gap="md">
            {pages.map((item) => (
              <Group key={item.href} gap="sm" wrap="nowrap" align="flex-start">
                <ThemeIcon variant="light" size="lg" radius="md">
                  <item.icon size={20} aria-hidden="true" />
                </ThemeIcon>
                <div>
                  <Anchor component={Link} to={item.href} fw={600}>
                    {item.label} <IconArrowRight size={14} aria-hidden="true" />
                  </Anchor>
                  <Text size="sm" c="dimmed">
                    {item.summary}
                  </Text>
                </div>
              </Group>
            ))}
            <Group gap="sm" wrap="nowrap" align="flex-start">
              <ThemeIcon variant="light" size="lg" radius="md">
                <IconKey size={20} aria-hidden="true" />
              </ThemeIcon>
              <div>
                <Anchor component={Link} to={paths.auth.forgotPassword.getHref(user.email)} fw={600}>
                  Change your password
                </Anchor>
                <Text size="sm" c="dimmed">
                  We e-mail you a link to choose a new one.
                </Text>
              </div>
            </Group>
          </Stack>
        </Card>

        {isStaff ? <BenchSafetyCard /> : null}

        {ROLE_OUTLOOK[user.role].length > 0 ? (
          <Card withBorder padding="lg" radius="lg" bg="gray.0">
            <Group gap="sm" mb="sm" wrap="nowrap">
              <ThemeIcon variant="light" color="gray" size="lg" radius="md">
                <IconHourglassHigh size={20} aria-hidden="true" />
              </ThemeIcon>
              <Title order={2} fz="h3">
                On the way
              </Title>
            </Group>
            <Text size="sm" c="dimmed" mb="sm">
              Not here yet; these pages arrive with the next releases of Keenroute.
            </Text>
            <List spacing="xs" size="sm">
              {ROLE_OUTLOOK[user.role].map((line) => (
                <List.Item key={line}>{line}</List.Item>
              ))}
            </List>
          </Card>
        ) : null}
      </SimpleGrid>
    </Stack>
  );
}
