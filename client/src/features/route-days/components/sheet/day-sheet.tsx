import { Alert, Anchor, Button, Card, Group, Stack, Text } from '@mantine/core';
import { IconArrowLeft, IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ListLoadFailed, ListLoading } from '@/components/list-states';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-error';
import { useSheet, useSheetPdf } from '../../api/get-sheet';
import { RouteDayMap } from '../map/route-day-map';
import { dayTitle } from '../../format';
import { SheetCautions } from './sheet-cautions';
import { SheetHeader } from './sheet-header';
import { SheetStopCard } from './sheet-stop-card';

/** The day sheet of one route day, phone first: header, stops in order as big cards, cautions, print. */
export function DaySheetView({ routeDayId }: { routeDayId: string }) {
  const sheet = useSheet(routeDayId);
  const pdf = useSheetPdf();

  if (sheet.isPending) return <ListLoading label="Loading the day sheet" />;
  if (sheet.isError) {
    if (sheet.error instanceof ApiError && sheet.error.status === 404) {
      return (
        <Alert color="gray" title="No such route day">
          <Stack gap="xs" align="flex-start">
            <Text size="sm">It may have been re-planned. The week shows the days as they are now.</Text>
            <Anchor component={Link} to={paths.weekPlan.getHref()}>
              Open the week
            </Anchor>
          </Stack>
        </Alert>
      );
    }
    return (
      <ListLoadFailed
        title="The day sheet could not be loaded"
        message={sheet.error.message}
        onRetry={() => void sheet.refetch()}
      />
    );
  }

  const { routeDay, stops } = sheet.data;
  return (
    <Stack gap="md" maw={720}>
      <Group justify="space-between" gap="sm">
        <Anchor component={Link} to={`${paths.weekPlan.getHref()}?week=${routeDay.day}`} size="sm">
          <Group gap={4} wrap="nowrap" mih={44}>
            <IconArrowLeft size={18} aria-hidden="true" />
            The week
          </Group>
        </Anchor>
        <Button
          leftSection={<IconPrinter size={20} />}
          variant="light"
          size="md"
          loading={pdf.isPending}
          onClick={() => pdf.mutate({ routeDayId, fileName: `day-sheet-${routeDay.day}.pdf` })}
        >
          Print / PDF
        </Button>
      </Group>
      <SheetHeader sheet={sheet.data} />
      {stops.length === 0 ? (
        <Card withBorder radius="lg" padding="xl">
          <Text ta="center">No stops on this day.</Text>
        </Card>
      ) : (
        <>
          <Stack component="ol" gap="md" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Stops in order">
            {stops.map((stop) => (
              <SheetStopCard key={stop.stopId} stop={stop} routeDayId={routeDay.id} />
            ))}
          </Stack>
          <RouteDayMap
            start={routeDay.start}
            stops={routeDay.stops}
            label={`${dayTitle(routeDay)} with ${routeDay.sharpener.name}`}
          />
        </>
      )}
      <SheetCautions cautions={sheet.data.cautions} />
    </Stack>
  );
}
