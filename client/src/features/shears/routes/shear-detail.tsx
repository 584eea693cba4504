import { PageHeader } from '@/components/page-header';

export function ShearDetailRoute() {
  return <PageHeader title="Shear" description="Being built." />;
}
