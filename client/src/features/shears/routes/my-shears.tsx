import { PageHeader } from '@/components/page-header';

export function MyShearsRoute() {
  return <PageHeader title="My shears" description="Being built." />;
}
