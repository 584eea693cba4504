import { Button, Container, Stack, Text, Title } from '@mantine/core';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** Shown when a page fails to load, most often a new release replacing the old page files. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : null;
  return (
    <Container size="sm" py="xl">
      <Stack gap="md" align="flex-start">
        <Title order={1}>This page could not be shown</Title>
        <Text>Reloading usually fixes it. If it keeps happening, tell the office what you were doing.</Text>
        {detail ? <Text c="dimmed">{detail}</Text> : null}
        <Button onClick={() => window.location.reload()}>Reload the page</Button>
      </Stack>
    </Container>
  );
}
