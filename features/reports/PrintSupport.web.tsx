import type { ReactElement } from 'react';

import { Button } from '@/components/Button';
import { SHELL_CHROME_IDS } from '@/features/shell/printHidden';

import { REPORT_CONTROLS_ID } from './reportControls';

const chrome = Object.values(SHELL_CHROME_IDS)
  .map((id) => `#${id}`)
  .join(', ');

// Printed, the page drops the shell's navigation and the report's own controls, and lets the
// scrolling column grow to its full length so that every page of it is printed.
const PRINT_CSS = `@media print {
  ${chrome}, #${REPORT_CONTROLS_ID} { display: none !important; }
  html, body, #root { height: auto !important; overflow: visible !important; background: #fff; }
  #root div { overflow: visible !important; }
  [role="img"] { break-inside: avoid; }
}`;

/** The report's print stylesheet (web only). */
export function PrintStyle(): ReactElement {
  return <style>{PRINT_CSS}</style>;
}

/** Opens the browser's print dialog, which also saves to PDF. */
export function PrintButton(): ReactElement {
  return <Button label="Print" onPress={() => window.print()} />;
}
