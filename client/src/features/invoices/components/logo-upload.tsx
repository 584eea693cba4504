import { Alert, Button, Card, Group, Image, Stack, Text, Title } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { notifications } from '@mantine/notifications';
import { IconPhoto, IconPhotoX, IconTrash, IconUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { useLogoPreview, useRemoveLogo, useUploadLogo } from '../api/business-logo';

export const LOGO_TYPES = ['image/png', 'image/jpeg', 'image/webp'];
export const LOGO_MAX_BYTES = 2 * 1024 * 1024;

function rejectionMessage(rejections: FileRejection[]): string {
  const codes = rejections.flatMap((rejection) => rejection.errors.map((error) => error.code));
  if (codes.includes('file-too-large')) return 'That file is larger than 2 MB. Save the logo smaller and try again.';
  if (codes.includes('file-invalid-type')) return 'The logo must be a PNG, JPEG or WebP image.';
  if (codes.includes('too-many-files')) return 'Drop one logo at a time.';
  return 'That file cannot be the logo.';
}

/** The logo printed at the top of every invoice; the server makes a PNG of it at most 600 px wide. */
export function LogoUpload({ logoUrl }: { logoUrl: string | null }) {
  const preview = useLogoPreview(logoUrl);
  const upload = useUploadLogo();
  const remove = useRemoveLogo();
  const [problem, setProblem] = useState<string | null>(null);

  const send = (file: File) => {
    setProblem(null);
    upload.mutate(file, {
      onSuccess: () => notifications.show({ color: 'keenTeal', title: 'Logo saved', message: file.name }),
      onError: (error) => setProblem(error.message),
    });
  };

  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="logo-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="logo-title">
          Logo
        </Title>
        {logoUrl ? (
          <Group gap="md" align="center">
            {preview.url ? (
              <Image src={preview.url} alt="The logo on the invoices" maw={240} mah={120} fit="contain" />
            ) : (
              <Text size="sm" c="dimmed">
                {preview.isPending ? 'Loading the logo…' : 'The logo could not be shown.'}
              </Text>
            )}
            <Button
              variant="subtle"
              color="red"
              leftSection={<IconTrash size={18} />}
              loading={remove.isPending}
              onClick={() => remove.mutate()}
            >
              Remove the logo
            </Button>
          </Group>
        ) : (
          <Text size="sm" c="dimmed">
            No logo yet: the invoices show the business name instead.
          </Text>
        )}
        <Dropzone
          onDrop={(files) => {
            const [file] = files;
            if (file) send(file);
          }}
          onReject={(rejections) => setProblem(rejectionMessage(rejections))}
          accept={LOGO_TYPES}
          maxSize={LOGO_MAX_BYTES}
          multiple={false}
          loading={upload.isPending}
          radius="md"
          p="md"
          inputProps={{ 'aria-label': 'Logo image' }}
        >
          <Group justify="center" gap="md" mih={72} wrap="nowrap" style={{ pointerEvents: 'none' }}>
            <Dropzone.Accept>
              <IconUpload size={32} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
            </Dropzone.Accept>
            <Dropzone.Reject>
              <IconPhotoX size={32} color="var(--mantine-color-red-6)" aria-hidden="true" />
            </Dropzone.Reject>
            <Dropzone.Idle>
              <IconPhoto size={32} color="var(--mantine-color-gray-6)" aria-hidden="true" />
            </Dropzone.Idle>
            <div>
              <Text fw={600}>{logoUrl ? 'Replace the logo' : 'Add a logo'}</Text>
              <Text size="sm" c="dimmed">
                Drop it here or tap to choose. PNG, JPEG or WebP, up to 2 MB.
              </Text>
            </div>
          </Group>
        </Dropzone>
        {problem ? (
          <Alert color="red" title="The logo was not saved" withCloseButton onClose={() => setProblem(null)}>
            {problem}
          </Alert>
        ) : null}
      </Stack>
    </Card>
  );
}
