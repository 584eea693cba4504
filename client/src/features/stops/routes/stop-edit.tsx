import { PageHeader } from '@/components/page-header';

export function StopEditRoute() {
  return <PageHeader title="Edit stop" description="Being built." />;
}
