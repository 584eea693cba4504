import { PageHeader } from '@/components/page-header';

export function CustomersRoute() {
  return <PageHeader title="Customers" description="Being built." />;
}
