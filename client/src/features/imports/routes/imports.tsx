import { PageHeader } from '@/components/page-header';

export function ImportsRoute() {
  return <PageHeader title="Import" description="Being built." />;
}
