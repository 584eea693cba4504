import { Button, Drawer, Grid, Group, Stack, Text } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconCalendarPlus, IconRoute, IconSettings } from '@tabler/icons-react';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { WeekPicker } from '@/features/stops/components/week-picker';
import { formatDateTime } from '@/lib/format';
import { useSignedInUser } from '@/lib/session';
import { canEditPlanningSettings, canPlanWeek, canReadPlanningSettings, hasCalendarFeed } from '../access';
import { usePlanningSettings } from '../api/planning-settings';
import { usePlanWeek } from '../api/plan-week';
import { useWeek } from '../api/get-week';
import { BoardContext } from '../components/board-context';
import { CalendarFeedPanel } from '../components/calendar-feed-panel';
import { ComingDuePanel } from '../components/coming-due-panel';
import { MoveStopModal } from '../components/move-stop-modal';
import { PlanProgress } from '../components/plan-progress';
import { PlanningSettingsSection } from '../components/settings-form';
import { UnplannedPanel } from '../components/unplanned-panel';
import { useWeekActions } from '../components/week-actions';
import { WeekBoard } from '../components/week-board';
import { WeekDnd } from '../components/week-dnd';
import { useWeekSearch } from '../hooks/use-week-search';
import type { Week } from '../types';

function planSummary(week: Week): string {
  const planned = week.days.reduce((sum, day) => sum + day.stops.length, 0);
  const withStops = week.days.filter((day) => day.stops.length > 0).length;
  const unplanned = week.unplanned.length;
  return `${planned} ${planned === 1 ? 'stop' : 'stops'} on ${withStops} route ${withStops === 1 ? 'day' : 'days'}; ${
    unplanned === 0 ? 'nothing left unplanned' : `${unplanned} not planned`
  }.`;
}

/** Week plan (owner, office) and My week (a sharpener's own days): the same page, shaped by the role. */
export function WeekPlanRoute() {
  const user = useSignedInUser();
  const planner = canPlanWeek(user.role);
  const { week: monday, setWeek, thisWeek } = useWeekSearch();
  const week = useWeek({ week: monday });
  const plan = usePlanWeek();
  const settings = usePlanningSettings(canReadPlanningSettings(user.role));
  const [settingsOpen, settingsDrawer] = useDisclosure(false);
  const phone = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });
  const actions = useWeekActions(week.data, monday, true, planner);

  const planWeek = () =>
    plan.mutate(
      { week: monday },
      {
        onSuccess: (result) =>
          notifications.show({ color: 'keenTeal', title: 'Week planned', message: planSummary(result) }),
      },
    );

  const data = week.data;
  return (
    <Stack gap="md">
      <PageHeader
        title={planner ? 'Week plan' : 'My week'}
        description={
          planner
            ? 'Route days by sharpener. Drag stops to reorder or move them; moved stops are locked in place.'
            : 'Your route days this week, stop by stop. Reorder your own stops by dragging or with Move to….'
        }
        actions={
          planner ? (
            <>
              <Button variant="default" leftSection={<IconSettings size={18} />} onClick={settingsDrawer.open}>
                Planning settings
              </Button>
              <Button leftSection={<IconRoute size={18} />} onClick={planWeek} loading={plan.isPending}>
                Plan the week
              </Button>
            </>
          ) : null
        }
      />

      <Group justify="space-between" gap="sm">
        <WeekPicker week={monday} thisWeek={thisWeek} onChange={setWeek} />
        {data?.plannedAt ? (
          <Text size="sm" c="dimmed">
            Planned {formatDateTime(data.plannedAt)}
            {data.solveMs !== null ? ` in ${(data.solveMs / 1000).toFixed(1)} s` : ''}
          </Text>
        ) : null}
      </Group>

      {plan.isPending ? <PlanProgress expectedSeconds={settings.data?.solveSeconds} /> : null}

      {week.isPending ? (
        <ListLoading label="Loading the week" />
      ) : week.isError ? (
        <ListLoadFailed
          title="The week could not be loaded"
          message={week.error.message}
          onRetry={() => void week.refetch()}
        />
      ) : actions.board ? (
        <BoardContext.Provider value={actions.board}>
          <WeekDnd week={week.data} onMove={actions.move}>
            <Grid gap="md">
              <Grid.Col span={{ base: 12, xl: 9 }}>
                {week.data.days.length === 0 ? (
                  <ListEmpty
                    icon={<IconCalendarPlus size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" />}
                    title="No route days this week yet"
                  >
                    <Text size="sm" c="dimmed">
                      {planner
                        ? 'Plan the week to make a route day for every sharpener and work day.'
                        : 'The office has not planned this week yet.'}
                    </Text>
                  </ListEmpty>
                ) : (
                  <WeekBoard week={week.data} />
                )}
              </Grid.Col>
              <Grid.Col span={{ base: 12, xl: 3 }}>
                <Stack gap="md">
                  <UnplannedPanel />
                  <ComingDuePanel week={week.data} monday={monday} />
                  {hasCalendarFeed(user.role) ? <CalendarFeedPanel /> : null}
                </Stack>
              </Grid.Col>
            </Grid>
          </WeekDnd>
          <MoveStopModal week={week.data} stopId={actions.moving} onClose={actions.closeMove} onMove={actions.move} />
        </BoardContext.Provider>
      ) : null}

      {planner ? (
        <Drawer
          opened={settingsOpen}
          onClose={settingsDrawer.close}
          title="Planning settings"
          position={phone ? 'bottom' : 'right'}
          size={phone ? '100%' : 'lg'}
        >
          <PlanningSettingsSection canEdit={canEditPlanningSettings(user.role)} onSaved={settingsDrawer.close} />
        </Drawer>
      ) : null}
    </Stack>
  );
}
