import { Group, Text } from '@mantine/core';

/** Keenroute's mark: a shear's two blades, one in brass, on teal. */
export function BrandMark({ size = 32 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="7" fill="var(--mantine-color-keenTeal-6)" />
      <path d="M9 24 23 8" stroke="var(--mantine-color-brass-6)" strokeWidth="3" strokeLinecap="round" />
      <path d="M9 8l6 7M17 17l6 7" stroke="var(--mantine-color-gray-0)" strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}

export function Brand({ size = 32 }: { size?: number }) {
  return (
    <Group gap="xs" wrap="nowrap">
      <BrandMark size={size} />
      <Text fw={700} fz={size > 30 ? 'xl' : 'lg'} c="keenTeal.8" style={{ letterSpacing: '-0.01em' }}>
        Keenroute
      </Text>
    </Group>
  );
}
