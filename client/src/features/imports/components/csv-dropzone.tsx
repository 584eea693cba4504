import '@mantine/dropzone/styles.css';
import { Group, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { IconFileSpreadsheet, IconUpload, IconX } from '@tabler/icons-react';
import { useState } from 'react';
import { MAX_IMPORT_BYTES } from '../types';

const ACCEPT = { 'text/csv': ['.csv'], 'application/vnd.ms-excel': ['.csv'] };

function rejectionMessage(rejections: FileRejection[]): string {
  const codes = rejections.flatMap((rejection) => rejection.errors.map((error) => error.code));
  if (codes.includes('too-many-files')) return 'Drop one file at a time.';
  if (codes.includes('file-too-large')) return 'That file is larger than 5 MB. Split it into smaller files.';
  return 'That is not a CSV file. Save the sheet as CSV UTF-8 and try again.';
}

interface CsvDropzoneProps {
  loading: boolean;
  onFile: (file: File) => void;
}

export function CsvDropzone({ loading, onFile }: CsvDropzoneProps) {
  const [rejected, setRejected] = useState<string | null>(null);
  return (
    <Stack gap={6}>
      <Dropzone
        accept={ACCEPT}
        maxSize={MAX_IMPORT_BYTES}
        multiple={false}
        loading={loading}
        radius="lg"
        inputProps={{ 'aria-label': 'CSV file to import' }}
        onDrop={(files) => {
          setRejected(null);
          if (files[0]) onFile(files[0]);
        }}
        onReject={(rejections) => setRejected(rejectionMessage(rejections))}
      >
        <Group justify="center" gap="md" mih={140} wrap="nowrap" style={{ pointerEvents: 'none' }}>
          <Dropzone.Accept>
            <IconUpload size={44} stroke={1.5} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
          </Dropzone.Accept>
          <Dropzone.Reject>
            <IconX size={44} stroke={1.5} color="var(--mantine-color-red-6)" aria-hidden="true" />
          </Dropzone.Reject>
          <Dropzone.Idle>
            <IconFileSpreadsheet size={44} stroke={1.5} color="var(--mantine-color-gray-6)" aria-hidden="true" />
          </Dropzone.Idle>
          <div>
            <Text fw={600}>Drop the CSV file here, or tap to choose it</Text>
            <Text size="sm" c="dimmed">
              One .csv file up to 5 MB. Nothing is imported until you have checked the preview.
            </Text>
          </div>
        </Group>
      </Dropzone>
      {rejected ? (
        <Text size="sm" c="red" role="alert">
          {rejected}
        </Text>
      ) : null}
    </Stack>
  );
}
