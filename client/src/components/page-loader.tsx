import { Center, Loader } from '@mantine/core';

export function PageLoader({ label = 'Loading' }: { label?: string }) {
  return (
    <Center mih="50vh" role="status" aria-label={label}>
      <Loader color="keenTeal" />
    </Center>
  );
}
