import { Button, Center, Group, Image, Loader, Modal, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { formatDateTime } from '@/lib/format';
import { useDeleteShearPhoto, useShearPhotoUrl } from '../api/shear-photos';
import type { ShearPhoto } from '../types';

interface PhotoViewerProps {
  shearId: string;
  tagCode: string;
  photo: ShearPhoto | null;
  canDelete: boolean;
  onClose: () => void;
}

function FullImage({ shearId, photo }: { shearId: string; photo: ShearPhoto }) {
  const { url, isError } = useShearPhotoUrl(shearId, photo.id, 'full');
  if (url)
    return <Image src={url} alt={`Photo of the shear, ${photo.width} × ${photo.height}`} fit="contain" mah="70vh" />;
  return (
    <Center mih={240}>
      {isError ? <Text c="dimmed">The photo could not be loaded.</Text> : <Loader aria-label="Loading the photo" />}
    </Center>
  );
}

/** The full image, and for owner and office a two-step delete. */
export function PhotoViewer({ shearId, tagCode, photo, canDelete, onClose }: PhotoViewerProps) {
  const remove = useDeleteShearPhoto(shearId);
  const [confirming, setConfirming] = useState(false);
  const close = () => {
    setConfirming(false);
    onClose();
  };

  return (
    <Modal opened={photo !== null} onClose={close} title={`Photo of ${tagCode}`} size="xl" centered>
      {photo ? (
        <Stack gap="sm">
          <FullImage shearId={shearId} photo={photo} />
          <Group justify="space-between" gap="sm">
            <Text size="xs" c="dimmed">
              Added {formatDateTime(photo.createdAt)} · {photo.width} × {photo.height} ·{' '}
              {Math.max(1, Math.round(photo.byteSize / 1024))} KB
            </Text>
            {canDelete ? (
              confirming ? (
                <Group gap="xs">
                  <Button variant="default" size="sm" onClick={() => setConfirming(false)}>
                    Keep it
                  </Button>
                  <Button
                    color="red"
                    size="sm"
                    loading={remove.isPending}
                    onClick={() =>
                      remove.mutate(photo.id, {
                        onSuccess: () => {
                          notifications.show({ color: 'keenTeal', title: 'Photo deleted', message: tagCode });
                          close();
                        },
                      })
                    }
                  >
                    Yes, delete
                  </Button>
                </Group>
              ) : (
                <Button color="red" variant="subtle" size="sm" onClick={() => setConfirming(true)}>
                  Delete photo
                </Button>
              )
            ) : null}
          </Group>
        </Stack>
      ) : null}
    </Modal>
  );
}
