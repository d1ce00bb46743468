'use client';

import { Button } from '@/components/ui/button';

// The browser's own print dialog; the sheet's print stylesheet does the rest.
export function PrintButton() {
  return (
    <Button type="button" className="no-print" onClick={() => window.print()}>
      Print
    </Button>
  );
}
