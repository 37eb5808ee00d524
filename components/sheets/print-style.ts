import { Platform } from 'react-native';

/*
 * On the web, printing the sheets gives one page per antenna: the app's navigation and buttons are hidden
 * and each sheet starts a new page. react-native-web writes dataSet as data-* attributes.
 */
const CSS = `@media print {
  [data-sheet="page"] { break-after: page; page-break-after: always; }
  [data-print="hide"], [role="navigation"], [data-testid="sheet-mark-up"], [data-testid="sheet-mark-down"] { display: none !important; }
  [data-print="all"] { display: flex !important; }
  body { background: #fff !important; }
}`;

let added = false;
export function addPrintStyle(): void {
  if (added || Platform.OS !== 'web' || typeof document === 'undefined') return;
  const el = document.createElement('style');
  el.setAttribute('data-loftline', 'sheet-print');
  el.textContent = CSS;
  document.head.appendChild(el);
  added = true;
}

export function printSheets(): void {
  if (Platform.OS === 'web' && typeof window !== 'undefined') window.print();
}

/** data-* attributes on the web (react-native-web's dataSet; the native types do not list it). */
export function webData(data: Record<string, string>): object {
  return { dataSet: data };
}
