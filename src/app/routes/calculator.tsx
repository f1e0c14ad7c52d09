import { CalculatorPage } from '@/features/calculator/components/calculator-page';

/** /calculator — the air-state calculator. */
export function CalculatorRoute() {
  return <CalculatorPage />;
}
