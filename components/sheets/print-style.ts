import { Platform } from 'react-native';

/*
 * On the web, printing the sheets gives one page per antenna: the app's navigation and buttons are hidden
 * and each sheet starts a new page. react-native-web writes dataSet as data-* attributes.
 * The app's screens are a fixed-height shell with a scrolling body (react-native-web's ScrollView is a div with
 * overflow: auto), which on paper would print only what fits the window: in print every box that holds a sheet
 * (found with :has) grows to its content and lets it flow onto as many pages as there are sheets.
 */
const CSS = `@media print {
  @page { margin: 12mm; }
  html, body, #root, div:has([data-sheet="page"]) {
    height: auto !important; min-height: 0 !important; max-height: none !important; overflow: visible !important;
    position: static !important; flex: none !important; transform: none !important; background: #fff !important;
  }
  [data-sheet="page"] { break-after: page; page-break-after: always; break-inside: avoid; margin-bottom: 0 !important; }
  /* A sheet holds a wire, two supports with photos, coax, keep-out and cautions: drawn at 70 % it fits one
     Letter or A4 page (a screen-sized sheet ran onto a second page once the leg directions were added). */
  [data-sheet="page"] { zoom: 0.7; }
  [data-sheet="page"] img { max-height: 160px !important; }
  [data-sheet="page"]:last-child { break-after: auto; page-break-after: auto; }
  [data-print="hide"], [role="navigation"], [data-testid="bottom-bar"], [data-testid="phone-header"],
  [data-testid="sheet-mark-up"], [data-testid="sheet-mark-down"] { display: none !important; }
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
