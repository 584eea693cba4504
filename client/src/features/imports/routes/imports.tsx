import { Alert, Stack } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { ApiError } from '@/lib/api-error';
import { useCommitImport } from '../api/commit-import';
import { usePreviewImport } from '../api/preview-import';
import { ColumnGuide } from '../components/column-guide';
import { CsvDropzone } from '../components/csv-dropzone';
import { ImportDone } from '../components/import-done';
import { ImportPreview } from '../components/import-preview';
import { KindPicker } from '../components/kind-picker';
import { rowErrorsFromFields } from '../row-errors';
import type { ImportKind } from '../types';

/** Why the server would not read the file (bad columns, not UTF-8, too large); other failures are notified. */
function fileRefusal(error: Error | null): string | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 413) return 'That file is larger than 5 MB. Split it into smaller files.';
  return error.status === 400 ? error.message : null;
}

export function ImportsRoute() {
  const [kind, setKind] = useState<ImportKind>('stops');
  const preview = usePreviewImport();
  const commit = useCommitImport();

  const startOver = () => {
    preview.reset();
    commit.reset();
  };
  const refused = commit.error instanceof ApiError && commit.error.status === 400 ? commit.error : null;
  const unreadable = fileRefusal(preview.error);

  return (
    <Stack gap="lg" maw={1100}>
      <PageHeader
        title="Import"
        description="Bring stops, customers and shears in from a spreadsheet saved as CSV. You see every row checked before anything is saved."
      />
      <KindPicker
        value={kind}
        onChange={(next) => {
          setKind(next);
          startOver();
        }}
      />
      {commit.data && preview.data ? (
        <ImportDone result={commit.data} fileName={preview.data.fileName} onAnother={startOver} />
      ) : preview.data ? (
        <ImportPreview
          preview={preview.data}
          errors={refused ? rowErrorsFromFields(refused.fields) : preview.data.errors}
          refusal={refused?.message ?? null}
          committing={commit.isPending}
          onCommit={() => commit.mutate(preview.data.id)}
          onStartOver={startOver}
        />
      ) : (
        <Stack gap="sm">
          <CsvDropzone
            loading={preview.isPending}
            onFile={(file) => {
              commit.reset();
              preview.mutate({ kind, file });
            }}
          />
          {unreadable ? (
            <Alert color="red" icon={<IconAlertTriangle size={20} />} title="The file could not be read">
              {unreadable}
            </Alert>
          ) : null}
        </Stack>
      )}
      {commit.data ? null : <ColumnGuide kind={kind} />}
    </Stack>
  );
}
