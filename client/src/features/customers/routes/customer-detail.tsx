import { PageHeader } from '@/components/page-header';

export function CustomerDetailRoute() {
  return <PageHeader title="Customer" description="Being built." />;
}
