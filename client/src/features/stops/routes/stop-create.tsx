import { PageHeader } from '@/components/page-header';

export function StopCreateRoute() {
  return <PageHeader title="New stop" description="Being built." />;
}
