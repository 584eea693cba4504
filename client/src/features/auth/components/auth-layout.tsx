import { Box, Container, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Brand } from '@/components/brand';

interface AuthLayoutProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
}

/** The signed-out pages: one calm card on a teal wash, comfortable on a phone. */
export function AuthLayout({ title, description, children }: AuthLayoutProps) {
  return (
    <Box
      mih="100dvh"
      py={{ base: 'lg', sm: 'xl' }}
      style={{
        background: 'linear-gradient(180deg, var(--mantine-color-keenTeal-0) 0%, var(--mantine-color-gray-0) 60%)',
      }}
    >
      <Container size={460} px={{ base: 'sm', sm: 'md' }}>
        <Stack gap="lg">
          <Box pt="md">
            <Brand size={36} />
          </Box>
          <Paper component="main" withBorder shadow="sm" radius="lg" p={{ base: 'md', sm: 'xl' }}>
            <Stack gap="md">
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
            Keenroute: route days, tickets and invoices for shear sharpening on the road.
          </Text>
        </Stack>
      </Container>
    </Box>
  );
}
