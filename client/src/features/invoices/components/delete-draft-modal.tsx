import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useDeleteDraft } from '../api/delete-invoice';

/** A draft was never sent, so it may go; its tickets wait for an invoice again. */
export function DeleteDraftModal({
  invoiceId,
  opened,
  onClose,
}: {
  invoiceId: string;
  opened: boolean;
  onClose: () => void;
}) {
  const navigate = useNavigate();
  const remove = useDeleteDraft(invoiceId);
  return (
    <Modal opened={opened} onClose={onClose} title="Delete the draft" centered>
      <Stack gap="md">
        <Text size="sm">
          Its tickets go back to the ones waiting for an invoice. Nothing was sent, so nothing else changes.
        </Text>
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Keep it
          </Button>
          <Button
            color="red"
            loading={remove.isPending}
            onClick={() =>
              remove.mutate(undefined, {
                onSuccess: () => {
                  notifications.show({
                    color: 'keenTeal',
                    title: 'Draft deleted',
                    message: 'Its tickets can be invoiced again.',
                  });
                  void navigate(paths.invoices.list.getHref());
                },
              })
            }
          >
            Delete the draft
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
