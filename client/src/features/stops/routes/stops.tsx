import { PageHeader } from '@/components/page-header';

export function StopsRoute() {
  return <PageHeader title="Stops" description="Being built." />;
}
