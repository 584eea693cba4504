import { Button, FileButton, Group, Image, Stack, Text } from '@mantine/core';
import { IconCamera } from '@tabler/icons-react';
import { useShearPhotoUrl } from '@/features/shears/api/shear-photos';
import { PHOTO_MAX_BYTES, PHOTO_TYPES } from '@/features/shears/components/photo-upload';
import { useState } from 'react';
import type { PhotoStage, TicketLine } from '../types';
import { useTicketScreen } from './ticket-context';

const STAGE_LABELS: Record<PhotoStage, string> = { before: 'Before', after: 'After' };

function Thumb({ shearId, photoId, stage }: { shearId: string; photoId: string; stage: PhotoStage | null }) {
  const { url } = useShearPhotoUrl(shearId, photoId, 'thumbnail');
  return (
    <Stack gap={2} align="center">
      <Image
        src={url ?? undefined}
        alt={`${stage ? STAGE_LABELS[stage] : 'Photo'} of the shear`}
        w={72}
        h={72}
        radius="md"
        fit="cover"
        bg="gray.1"
      />
      <Text size="xs" c="dimmed">
        {stage ? STAGE_LABELS[stage] : 'Photo'}
      </Text>
    </Stack>
  );
}

/** Before and after photos from the phone's camera, kept with the shear and this line. */
export function LinePhotos({ line }: { line: TicketLine }) {
  const { ticket, saver } = useTicketScreen();
  const [problem, setProblem] = useState<string | null>(null);
  const photos = line.photos ?? [];
  const send = (stage: PhotoStage, file: File | null) => {
    if (!file) return;
    if (!PHOTO_TYPES.includes(file.type)) return setProblem('Photos must be JPEG, PNG or WebP images.');
    if (file.size > PHOTO_MAX_BYTES) return setProblem('That photo is larger than 10 MB. Take it at a smaller size.');
    setProblem(null);
    void saver.save({ kind: 'photo', lineId: line.id, stage, file });
  };
  const canAdd = ticket.status !== 'handed-back';
  return (
    <Stack gap="xs">
      {photos.length > 0 ? (
        <Group gap="sm" aria-label={`Photos of ${line.shear.tagCode}`} role="group">
          {photos.map((photo) => (
            <Thumb key={photo.id} shearId={line.shear.id} photoId={photo.id} stage={photo.stage} />
          ))}
        </Group>
      ) : null}
      {canAdd ? (
        <Group grow gap="sm">
          {(['before', 'after'] as const).map((stage) => (
            <FileButton
              key={stage}
              onChange={(file) => send(stage, file)}
              accept={PHOTO_TYPES.join(',')}
              capture="environment"
            >
              {(props) => (
                <Button {...props} variant="default" size="md" mih={44} leftSection={<IconCamera size={18} />}>
                  {STAGE_LABELS[stage]} photo
                </Button>
              )}
            </FileButton>
          ))}
        </Group>
      ) : null}
      {problem ? (
        <Text size="sm" c="red.8" role="alert">
          {problem}
        </Text>
      ) : null}
    </Stack>
  );
}
