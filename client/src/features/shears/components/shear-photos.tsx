import { Card, Group, Stack, Text, Title } from '@mantine/core';
import { useState } from 'react';
import type { ShearDetail, ShearPhoto } from '../types';
import { PhotoThumb } from './photo-thumb';
import { PhotoUpload } from './photo-upload';
import { PhotoViewer } from './photo-viewer';

interface ShearPhotosProps {
  shear: ShearDetail;
  canUpload: boolean;
  canDelete: boolean;
}

export function ShearPhotos({ shear, canUpload, canDelete }: ShearPhotosProps) {
  const [open, setOpen] = useState<ShearPhoto | null>(null);
  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="shear-photos-title">
      <Stack gap="sm">
        <Title order={2} fz="h4" id="shear-photos-title">
          Photos
        </Title>
        {shear.photos.length > 0 ? (
          <Group gap="sm" role="list" aria-label="Photos of the shear">
            {shear.photos.map((photo) => (
              <div role="listitem" key={photo.id}>
                <PhotoThumb shearId={shear.id} photo={photo} onOpen={() => setOpen(photo)} />
              </div>
            ))}
          </Group>
        ) : (
          <Text size="sm" c="dimmed">
            No photos yet.
          </Text>
        )}
        {canUpload ? <PhotoUpload shearId={shear.id} /> : null}
      </Stack>
      <PhotoViewer
        shearId={shear.id}
        tagCode={shear.tagCode}
        photo={open}
        canDelete={canDelete}
        onClose={() => setOpen(null)}
      />
    </Card>
  );
}
