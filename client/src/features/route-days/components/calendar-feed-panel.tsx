import {
  ActionIcon,
  Button,
  Card,
  CopyButton,
  Group,
  Modal,
  Skeleton,
  Stack,
  Text,
  TextInput,
  Title,
  Tooltip,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconCheck, IconCopy, IconRefresh } from '@tabler/icons-react';
import { useCalendarFeed, useRenewCalendarFeed } from '../api/calendar-feed';

/** The caller's own iCalendar address, to subscribe to their route days from a phone's calendar. */
export function CalendarFeedPanel() {
  const feed = useCalendarFeed();
  const renew = useRenewCalendarFeed();
  const [confirming, confirm] = useDisclosure(false);

  const makeNew = () =>
    renew.mutate(undefined, {
      onSuccess: () => {
        confirm.close();
        notifications.show({
          color: 'keenTeal',
          title: 'New calendar address made',
          message: 'The old address no longer works. Give calendars the new one.',
        });
      },
    });

  return (
    <Card withBorder radius="md" padding="md" component="section" aria-labelledby="calendar-feed-title">
      <Title order={2} fz="h4" id="calendar-feed-title" mb={4}>
        Calendar feed
      </Title>
      <Text size="sm" c="dimmed" mb="xs">
        Subscribe to this address in your phone’s calendar to see your route days. Keep it to yourself: anyone with it
        can read your days.
      </Text>
      {feed.isPending ? (
        <Skeleton height={42} />
      ) : feed.isError ? (
        <Text size="sm" c="red">
          {feed.error.message}
        </Text>
      ) : (
        <Stack gap="xs">
          <Group gap={4} wrap="nowrap" align="flex-end">
            <TextInput
              label="Calendar address"
              value={feed.data.url}
              readOnly
              onFocus={(event) => event.currentTarget.select()}
              style={{ flex: 1, minWidth: 0 }}
            />
            <CopyButton value={feed.data.url} timeout={2000}>
              {({ copied, copy }) => (
                <Tooltip label={copied ? 'Copied' : 'Copy the address'} withArrow>
                  <ActionIcon
                    variant="light"
                    color={copied ? 'keenTeal' : 'gray'}
                    onClick={copy}
                    aria-label={copied ? 'Copied' : 'Copy the address'}
                  >
                    {copied ? <IconCheck size={20} /> : <IconCopy size={20} />}
                  </ActionIcon>
                </Tooltip>
              )}
            </CopyButton>
          </Group>
          <Button
            variant="subtle"
            color="red"
            leftSection={<IconRefresh size={18} />}
            onClick={confirm.open}
            style={{ alignSelf: 'flex-start' }}
          >
            Make a new address
          </Button>
        </Stack>
      )}
      <Modal opened={confirming} onClose={confirm.close} title="Make a new calendar address?" centered>
        <Stack gap="md">
          <Text size="sm">
            The current address stops working at once. Any calendar subscribed to it must be given the new one. Do this
            if the address was shared by mistake.
          </Text>
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={confirm.close}>
              Keep the address
            </Button>
            <Button color="red" loading={renew.isPending} onClick={makeNew}>
              Make a new address
            </Button>
          </Group>
        </Stack>
      </Modal>
    </Card>
  );
}
