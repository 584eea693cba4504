import { Card, Group, List, Text, ThemeIcon, Title } from '@mantine/core';
import { IconShieldCheck } from '@tabler/icons-react';

/** The usual cautions of the bench; the equipment maker and local rules have the last word. */
export function BenchSafetyCard() {
  return (
    <Card withBorder padding="lg" radius="lg" style={{ borderLeft: '4px solid var(--mantine-color-brass-6)' }}>
      <Group gap="sm" mb="sm" wrap="nowrap">
        <ThemeIcon color="brass" variant="light" size="lg" radius="md">
          <IconShieldCheck size={20} aria-hidden="true" />
        </ThemeIcon>
        <Title order={2} fz="h3">
          At the bench
        </Title>
      </Group>
      <List spacing="xs" size="sm">
        <List.Item>Wear a dust mask or run the extraction: honing throws fine metal and abrasive dust.</List.Item>
        <List.Item>
          Watch the heat. A blade too hot to touch means lighter pressure and slower work, or the temper suffers.
        </List.Item>
        <List.Item>Fold the burr off across the edge, never along it.</List.Item>
        <List.Item>Keep fingers clear of the edge, on the hone and when handing shears back.</List.Item>
      </List>
      <Text size="sm" c="dimmed" mt="sm">
        Follow the equipment maker&apos;s instructions and your local workplace-safety rules; they come first.
      </Text>
    </Card>
  );
}
