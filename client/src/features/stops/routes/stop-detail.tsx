import { PageHeader } from '@/components/page-header';

export function StopDetailRoute() {
  return <PageHeader title="Stop" description="Being built." />;
}
