import { Group, Pagination, Text } from '@mantine/core';

interface ListFooterProps {
  page: number;
  pageSize: number;
  total: number;
  loadingNext: boolean;
  onPage: (page: number) => void;
}

/** "26–50 of 60" and the page buttons, under any list. */
export function ListFooter({ page, pageSize, total, loadingNext, onPage }: ListFooterProps) {
  if (total === 0) return null;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <Group justify="space-between" gap="sm">
      <Text size="sm" c="dimmed" aria-live="polite">
        {first}–{last} of {total}
        {loadingNext ? ' · loading…' : ''}
      </Text>
      {pages > 1 ? (
        <Pagination
          total={pages}
          value={Math.min(page, pages)}
          onChange={onPage}
          size="md"
          siblings={1}
          boundaries={1}
          getControlProps={(control) => ({ 'aria-label': `${control} page` })}
        />
      ) : null}
    </Group>
  );
}
