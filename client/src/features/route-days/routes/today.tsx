import { Anchor, Text } from '@mantine/core';
import { IconCoffee } from '@tabler/icons-react';
import { weekStart } from '@keenroute/shared';
import { Link } from 'react-router-dom';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { paths } from '@/config/paths';
import { todayIso } from '@/features/stops/format';
import { formatDay } from '@/lib/format';
import { useSignedInUser } from '@/lib/session';
import { useWeek } from '../api/get-week';
import { DaySheetView } from '../components/sheet/day-sheet';

/** The caller's route day for today (in the business's time zone), as its day sheet. */
export function TodayRoute() {
  const user = useSignedInUser();
  const week = useWeek({ week: weekStart(todayIso()) });

  if (week.isPending) return <ListLoading label="Finding today’s route day" />;
  if (week.isError) {
    return (
      <ListLoadFailed
        title="Today could not be loaded"
        message={week.error.message}
        onRetry={() => void week.refetch()}
      />
    );
  }
  const today = week.data.days.find((day) => day.day === week.data.today && day.sharpener.id === user.id);
  if (!today) {
    return (
      <ListEmpty
        icon={<IconCoffee size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" />}
        title="No route day today"
      >
        <Text size="sm" c="dimmed">
          {formatDay(week.data.today)} has no route day for you.
        </Text>
        <Anchor component={Link} to={paths.weekPlan.getHref()} size="lg" py={8}>
          See my week
        </Anchor>
      </ListEmpty>
    );
  }
  return <DaySheetView routeDayId={today.id} />;
}
