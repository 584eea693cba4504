import { Button, Group, Modal, Skeleton, Stack, Text } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconCalendarPlus } from '@tabler/icons-react';
import { showFieldErrors } from '@/lib/form-errors';
import { useStopVisits } from '../../api/get-stop-visits';
import { useRecordVisit } from '../../api/record-visit';
import { formatDay, todayIso } from '../../format';
import type { StopDetail } from '../../types';
import { SharpenerSelect } from '../sharpener-select';
import { DetailCard } from './detail-card';

interface VisitValues {
  workedOn: string | null;
  sharpenerId: string | null;
}

function RecordVisitModal({ stop, opened, onClose }: { stop: StopDetail; opened: boolean; onClose: () => void }) {
  const record = useRecordVisit();
  const today = todayIso();
  const form = useForm<VisitValues>({
    initialValues: { workedOn: today, sharpenerId: stop.assignedSharpener?.id ?? null },
    validate: { workedOn: (value) => (value ? null : 'Pick the day the visit was worked.') },
  });
  const close = () => {
    form.reset();
    onClose();
  };
  const submit = form.onSubmit((values) => {
    const visit = {
      workedOn: values.workedOn ?? today,
      ...(values.sharpenerId ? { sharpenerId: values.sharpenerId } : {}),
    };
    record.mutate(
      { stopId: stop.id, visit },
      {
        onSuccess: () => {
          notifications.show({
            color: 'keenTeal',
            title: 'Visit recorded',
            message: `${stop.name}, ${formatDay(visit.workedOn)}. Next due moves on from it.`,
          });
          close();
        },
        onError: (error) => void showFieldErrors(form, error),
      },
    );
  });
  return (
    <Modal opened={opened} onClose={close} title={`Record a visit to ${stop.name}`} centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            For a visit worked outside a route day; route days record their own.
          </Text>
          <DatePickerInput
            label="Worked on"
            required
            maxDate={today}
            valueFormat="D MMM YYYY"
            size="md"
            {...form.getInputProps('workedOn')}
          />
          <SharpenerSelect
            label="Sharpener"
            placeholder="Who worked it"
            current={stop.assignedSharpener}
            value={form.values.sharpenerId}
            onChange={(id) => form.setFieldValue('sharpenerId', id)}
            error={form.errors.sharpenerId}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={record.isPending}>
              Record the visit
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}

export function VisitsCard({ stop, canRecord }: { stop: StopDetail; canRecord: boolean }) {
  const visits = useStopVisits(stop.id);
  const [opened, modal] = useDisclosure(false);
  const items = visits.data?.items ?? [];
  return (
    <DetailCard
      title="Visits"
      actions={
        canRecord ? (
          <Button variant="light" leftSection={<IconCalendarPlus size={18} />} onClick={modal.open}>
            Record a visit
          </Button>
        ) : null
      }
    >
      {visits.isPending ? (
        <Stack gap="xs" role="status" aria-label="Loading the visits">
          <Skeleton height={20} />
          <Skeleton height={20} />
        </Stack>
      ) : visits.isError ? (
        <Group gap="sm">
          <Text size="sm" c="red">
            The visits could not be loaded.
          </Text>
          <Button variant="subtle" size="sm" onClick={() => void visits.refetch()}>
            Try again
          </Button>
        </Group>
      ) : items.length === 0 ? (
        <Text size="sm" c="dimmed">
          No visits recorded yet: the stop is due now.
        </Text>
      ) : (
        <Stack gap={0} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {items.map((visit) => (
            <Group
              key={visit.id}
              component="li"
              justify="space-between"
              py={8}
              style={{ borderBottom: '1px solid var(--mantine-color-gray-2)' }}
            >
              <Text size="sm" fw={600}>
                {formatDay(visit.workedOn)}
              </Text>
              <Text size="sm" c="dimmed">
                {visit.sharpener?.name ?? 'Sharpener not recorded'}
              </Text>
            </Group>
          ))}
          {visits.data && visits.data.total > items.length ? (
            <Text size="xs" c="dimmed" mt="xs">
              The latest {items.length} of {visits.data.total} visits.
            </Text>
          ) : null}
        </Stack>
      )}
      {canRecord ? <RecordVisitModal stop={stop} opened={opened} onClose={modal.close} /> : null}
    </DetailCard>
  );
}
