import { Button, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPencil, IconPrinter } from '@tabler/icons-react';
import { useParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { RecordLoadFailed } from '@/features/customers/components/record-states';
import { useSignedInUser } from '@/lib/session';
import { canDeleteShearPhotos, canManageShears, canSeeEdgeRecipe, canUploadShearPhotos } from '../access';
import { useShear } from '../api/get-shear';
import { usePrintLabels } from '../api/print-labels';
import { ShearFormModal } from '../components/shear-form-modal';
import { ShearHistory } from '../components/shear-history';
import { ShearPhotos } from '../components/shear-photos';
import { ShearRecipe } from '../components/shear-recipe';
import { ShearSummaryCard } from '../components/shear-summary-card';
import { makeAndModel } from '../labels';

export function ShearDetailRoute() {
  const { shearId = '' } = useParams();
  const { role } = useSignedInUser();
  const shear = useShear(shearId);
  const print = usePrintLabels();
  const [editOpened, editModal] = useDisclosure(false);
  const canManage = canManageShears(role);

  if (shear.isPending) return <PageLoader label="Loading the shear" />;
  if (shear.isError) {
    return (
      <RecordLoadFailed
        what="shear"
        error={shear.error}
        onRetry={() => void shear.refetch()}
        back={
          role === 'client'
            ? { to: paths.shears.mine.getHref(), label: 'Back to my shears' }
            : { to: paths.shears.list.getHref(), label: 'Back to the shears' }
        }
      />
    );
  }

  const record = shear.data;
  return (
    <Stack gap="lg" maw={1200}>
      <Group justify="space-between" align="flex-end" gap="md">
        <Stack gap={0}>
          <Text size="sm" c="dimmed">
            Tag code
          </Text>
          <Title order={1} ff="monospace" fz={{ base: 34, sm: 44 }} style={{ letterSpacing: '0.05em' }}>
            {record.tagCode}
          </Title>
          <Text c="dimmed">{makeAndModel(record)}</Text>
        </Stack>
        {canManage ? (
          <Group gap="sm">
            <Button variant="default" leftSection={<IconPencil size={18} />} onClick={editModal.open}>
              Edit
            </Button>
            <Button
              variant="default"
              leftSection={<IconPrinter size={18} />}
              loading={print.isPending}
              onClick={() =>
                print.mutate({ selection: { ids: [record.id] }, fileName: `tag-label-${record.tagCode}.pdf` })
              }
            >
              Print tag label
            </Button>
          </Group>
        ) : null}
      </Group>

      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
        <ShearSummaryCard shear={record} canManage={canManage} />
        <ShearHistory history={record.history} />
      </SimpleGrid>
      <ShearPhotos shear={record} canUpload={canUploadShearPhotos(role)} canDelete={canDeleteShearPhotos(role)} />
      {canSeeEdgeRecipe(role) ? <ShearRecipe shear={record} /> : null}
      {canManage ? <ShearFormModal opened={editOpened} onClose={editModal.close} shear={record} /> : null}
    </Stack>
  );
}
