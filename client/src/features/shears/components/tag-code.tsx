import { Text } from '@mantine/core';

/** A tag code in monospace, so KR-000123 reads digit by digit as it is printed on the tag. */
export function TagCode({ code, size = 'sm' }: { code: string; size?: string }) {
  return (
    <Text span ff="monospace" fw={700} size={size} style={{ letterSpacing: '0.03em', whiteSpace: 'nowrap' }}>
      {code}
    </Text>
  );
}
