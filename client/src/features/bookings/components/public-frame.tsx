import { Anchor, Box, Container, Group, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Brand } from '@/components/brand';
import { paths } from '@/config/paths';

interface PublicFrameProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
}

/** The signed-out booking pages: the teal wash of the sign-in page, a little wider for the form. */
export function PublicFrame({ title, description, children }: PublicFrameProps) {
  return (
    <Box
      mih="100dvh"
      py={{ base: 'md', sm: 'xl' }}
      style={{
        background: 'linear-gradient(180deg, var(--mantine-color-keenTeal-0) 0%, var(--mantine-color-gray-0) 50%)',
      }}
    >
      <Container size={720} px={{ base: 'sm', sm: 'md' }}>
        <Stack gap="lg">
          <Group justify="space-between" pt="sm">
            <Brand size={32} />
            <Anchor component={Link} to={paths.auth.signIn.getHref()} fw={600} py="xs">
              Sign in
            </Anchor>
          </Group>
          <Paper component="main" withBorder shadow="sm" radius="lg" p={{ base: 'md', sm: 'xl' }}>
            <Stack gap="lg">
              <div>
                <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
                  {title}
                </Title>
                {description ? (
                  <Text c="dimmed" mt={6}>
                    {description}
                  </Text>
                ) : null}
              </div>
              {children}
            </Stack>
          </Paper>
          <Text size="xs" c="dimmed" ta="center">
            Keenroute: shear sharpening on the road, at your salon or grooming shop.
          </Text>
        </Stack>
      </Container>
    </Box>
  );
}
