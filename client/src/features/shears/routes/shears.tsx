import { PageHeader } from '@/components/page-header';

export function ShearsRoute() {
  return <PageHeader title="Shears" description="Being built." />;
}
