import { Center, Image, Loader, Text, UnstyledButton } from '@mantine/core';
import { IconPhotoOff } from '@tabler/icons-react';
import { formatDate } from '@/lib/format';
import { useShearPhotoUrl } from '../api/shear-photos';
import type { ShearPhoto } from '../types';

const TILE = 112;

/** One thumbnail, fetched with the auth header; a click opens the full image. */
export function PhotoThumb({ shearId, photo, onOpen }: { shearId: string; photo: ShearPhoto; onOpen: () => void }) {
  const { url, isError } = useShearPhotoUrl(shearId, photo.id, 'thumbnail');
  return (
    <UnstyledButton
      onClick={onOpen}
      aria-label={`Open the photo from ${formatDate(photo.createdAt)}`}
      w={TILE}
      h={TILE}
      style={{
        borderRadius: 'var(--mantine-radius-md)',
        overflow: 'hidden',
        border: '1px solid var(--mantine-color-gray-3)',
        background: 'var(--mantine-color-gray-0)',
      }}
    >
      {url ? (
        <Image src={url} alt="" w={TILE} h={TILE} fit="cover" />
      ) : (
        <Center h="100%">
          {isError ? (
            <Text size="xs" c="dimmed" ta="center">
              <IconPhotoOff size={20} aria-hidden="true" />
              <br />
              Not available
            </Text>
          ) : (
            <Loader size="sm" />
          )}
        </Center>
      )}
    </UnstyledButton>
  );
}
