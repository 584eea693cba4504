import { Button } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** For the day sheet: opens one stop's visit, where its tickets are worked. */
export function StopVisitLink({
  routeDayId,
  stopId,
  stopName,
}: {
  routeDayId: string;
  stopId: string;
  stopName: string;
}) {
  return (
    <Button
      component={Link}
      to={paths.routeDays.stopVisit.getHref(routeDayId, stopId)}
      size="lg"
      rightSection={<IconArrowRight size={20} aria-hidden="true" />}
      aria-label={`Work the stop: ${stopName}`}
    >
      Work this stop
    </Button>
  );
}
