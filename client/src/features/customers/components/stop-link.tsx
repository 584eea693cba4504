import { Anchor, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/lib/session';
import { canOpenStops } from '../access';
import type { Ref } from '../types';

/** A stop's name, linked for the staff who may open stop pages. */
export function StopLink({ stop, size = 'sm' }: { stop: Ref | null; size?: string }) {
  const { role } = useSignedInUser();
  if (!stop) {
    return (
      <Text span size={size} c="dimmed">
        No stop
      </Text>
    );
  }
  if (!canOpenStops(role)) {
    return (
      <Text span size={size}>
        {stop.name}
      </Text>
    );
  }
  return (
    <Anchor component={Link} to={paths.stops.detail.getHref(stop.id)} size={size}>
      {stop.name}
    </Anchor>
  );
}
