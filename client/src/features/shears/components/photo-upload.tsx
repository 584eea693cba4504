import { Alert, Group, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { notifications } from '@mantine/notifications';
import { IconCameraPlus, IconPhotoX, IconUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { useUploadShearPhoto } from '../api/shear-photos';

export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'];
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;

function rejectionMessage(rejections: FileRejection[]): string {
  const codes = rejections.flatMap((rejection) => rejection.errors.map((error) => error.code));
  if (codes.includes('file-too-large'))
    return 'That file is larger than 10 MB. Take the photo again at a smaller size.';
  if (codes.includes('file-invalid-type')) return 'Photos must be JPEG, PNG or WebP images.';
  if (codes.includes('too-many-files')) return 'Add one photo at a time.';
  return 'That file cannot be added as a photo.';
}

/** Drop or pick a photo; whatever the server refuses, it says why here. */
export function PhotoUpload({ shearId }: { shearId: string }) {
  const upload = useUploadShearPhoto(shearId);
  const [problem, setProblem] = useState<string | null>(null);

  const send = (file: File) => {
    setProblem(null);
    upload.mutate(file, {
      onSuccess: () => notifications.show({ color: 'keenTeal', title: 'Photo added', message: file.name }),
      onError: (error) => setProblem(error.message),
    });
  };

  return (
    <Stack gap="xs">
      <Dropzone
        onDrop={(files) => {
          const [file] = files;
          if (file) send(file);
        }}
        onReject={(rejections) => setProblem(rejectionMessage(rejections))}
        accept={PHOTO_TYPES}
        maxSize={PHOTO_MAX_BYTES}
        multiple={false}
        loading={upload.isPending}
        radius="md"
        p="md"
        aria-label="Add a photo"
      >
        <Group justify="center" gap="md" mih={72} wrap="nowrap" style={{ pointerEvents: 'none' }}>
          <Dropzone.Accept>
            <IconUpload size={32} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
          </Dropzone.Accept>
          <Dropzone.Reject>
            <IconPhotoX size={32} color="var(--mantine-color-red-6)" aria-hidden="true" />
          </Dropzone.Reject>
          <Dropzone.Idle>
            <IconCameraPlus size={32} color="var(--mantine-color-gray-6)" aria-hidden="true" />
          </Dropzone.Idle>
          <div>
            <Text fw={600}>Add a photo</Text>
            <Text size="sm" c="dimmed">
              Drop it here or tap to choose. JPEG, PNG or WebP, up to 10 MB.
            </Text>
          </div>
        </Group>
      </Dropzone>
      {problem ? (
        <Alert color="red" title="The photo was not added" withCloseButton onClose={() => setProblem(null)}>
          {problem}
        </Alert>
      ) : null}
    </Stack>
  );
}
