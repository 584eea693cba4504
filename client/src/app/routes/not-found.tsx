import { Button, Container, Stack, Text, Title } from '@mantine/core';
import { Link, useLocation } from 'react-router-dom';
import { Brand } from '@/components/brand';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  const { pathname } = useLocation();
  return (
    <Container size="sm" py="xl" component="main">
      <Stack gap="lg" align="flex-start">
        <Brand />
        <Title order={1}>Page not found</Title>
        <Text>
          Nothing lives at <code>{pathname}</code>. The link may be mistyped, or the page may have moved.
        </Text>
        <Button component={Link} to={paths.home.getHref()}>
          Go to Home
        </Button>
      </Stack>
    </Container>
  );
}
