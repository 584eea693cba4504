import { Select } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { SHEAR_STATUS_LABELS, isShearStatus } from '@keenroute/shared';
import { useUpdateShear } from '../api/save-shear';
import { STATUS_OPTIONS } from '../labels';
import type { ShearSummary } from '../types';

/** Owner and office mark a shear retired or lost (or back in service) in one step. */
export function StatusControl({ shear }: { shear: ShearSummary }) {
  const update = useUpdateShear({ handlesFieldErrors: false });
  return (
    <Select
      label="Status"
      data={STATUS_OPTIONS}
      value={shear.status}
      allowDeselect={false}
      disabled={update.isPending}
      w={180}
      comboboxProps={{ withinPortal: true }}
      onChange={(value) => {
        if (!isShearStatus(value) || value === shear.status) return;
        update.mutate(
          { id: shear.id, changes: { status: value } },
          {
            onSuccess: (saved) =>
              notifications.show({
                color: 'keenTeal',
                title: 'Status changed',
                message: `${saved.tagCode} is now ${SHEAR_STATUS_LABELS[saved.status]}.`,
              }),
          },
        );
      }}
    />
  );
}
