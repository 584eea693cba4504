import { PageHeader } from '@/components/page-header';

export function ComingDueRoute() {
  return <PageHeader title="Coming due" description="Being built." />;
}
