import { ComingSoon } from '@/components/layout/coming-soon';

export const metadata = { title: 'Calculator' };

export default function CalculatorPage() {
  return <ComingSoon title="Calculator" what="Recipe scaling to batch sizes and molds, and a colour check for any photo or pair of colours, will live here." />;
}
