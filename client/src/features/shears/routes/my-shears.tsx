import { Anchor, Card, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { describeShear } from '@keenroute/shared';
import { IconScissors } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ListFooter } from '@/features/customers/components/list-footer';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { formatDay } from '@/lib/format';
import { positiveInt } from '@/features/customers/hooks/use-list-search';
import { upperFirst } from '@/lib/format';
import { useShears } from '../api/get-shears';
import { ShearStatusBadge } from '../components/status-badge';
import { TagCode } from '../components/tag-code';
import { makeAndModel } from '../labels';
import type { ShearSummary } from '../types';

const PAGE_SIZE = 24;

function MyShearCard({ shear }: { shear: ShearSummary }) {
  return (
    <Card
      component={Link}
      to={paths.shears.detail.getHref(shear.id)}
      withBorder
      radius="lg"
      padding="lg"
      aria-label={`${shear.tagCode}: ${describeShear(shear)}`}
      style={{ textDecoration: 'none', color: 'inherit' }}
    >
      <Group justify="space-between" align="flex-start" gap="xs" wrap="nowrap">
        <TagCode code={shear.tagCode} size="xl" />
        <ShearStatusBadge status={shear.status} />
      </Group>
      <Text fw={600} mt="xs">
        {makeAndModel(shear)}
      </Text>
      <Text size="sm">{upperFirst(describeShear(shear))}</Text>
      <Text size="sm" c="dimmed" mt="xs">
        {shear.lastServicedOn ? `Last serviced ${formatDay(shear.lastServicedOn)}` : 'Not serviced yet'}
      </Text>
    </Card>
  );
}

/** A client's own shears; the server answers with theirs only. */
export function MyShearsRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const page = positiveInt(searchParams.get('page'), 1);
  const list = useShears({ page, pageSize: PAGE_SIZE, sort: 'tagCode', order: 'asc' });
  const shears = list.data?.items ?? [];

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="My shears"
        description="Each of your shears with its tag code, what kind it is and when it was last sharpened."
      />
      {list.isPending ? (
        <ListLoading label="Loading your shears" />
      ) : list.isError ? (
        <ListLoadFailed
          title="Your shears could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : shears.length === 0 ? (
        <ListEmpty
          icon={<IconScissors size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title="No shears here yet"
        >
          <Text size="sm" c="dimmed" maw={460}>
            Your shears appear here once your sharpener registers them, usually at their first visit or drop-off. Each
            one gets a tag code (like KR-000123) that stays with it.
          </Text>
          {page > 1 ? (
            <Anchor component={Link} to={paths.shears.mine.getHref()}>
              Go to the first page
            </Anchor>
          ) : null}
        </ListEmpty>
      ) : (
        <SimpleGrid
          cols={{ base: 1, sm: 2, lg: 3 }}
          spacing="md"
          component="ul"
          p={0}
          m={0}
          style={{ listStyle: 'none' }}
        >
          {shears.map((shear) => (
            <li key={shear.id}>
              <MyShearCard shear={shear} />
            </li>
          ))}
        </SimpleGrid>
      )}
      <ListFooter
        page={page}
        pageSize={PAGE_SIZE}
        total={list.data?.total ?? 0}
        loadingNext={list.isPlaceholderData}
        onPage={(next) => setSearchParams(next === 1 ? {} : { page: String(next) })}
      />
    </Stack>
  );
}
