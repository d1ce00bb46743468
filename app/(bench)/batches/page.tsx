import { ComingSoon } from '@/components/layout/coming-soon';

export const metadata = { title: 'Batches' };

export default function BatchesPage() {
  return <ComingSoon title="Batches" what="Production batches of an approved standard will be logged and checked here against its tolerance." />;
}
