/**
 * Print rules for the board: the list for the dock on plain paper, without the site's header, navigation,
 * footer, filters and buttons. Scoped to the board screen by being rendered only there.
 */
const PRINT_CSS = `
@media print {
  @page { size: landscape; margin: 10mm; }
  #root > div > header, #root > div > footer, #root > div > a { display: none !important; }
  #root main { padding: 0 !important; }
  html, body { background: #fff !important; }
  [data-board], [data-board] [role=region] { overflow: visible !important; font-size: 9.5pt; }
  [data-board] table { min-width: 0 !important; }
  [data-board] *, [data-print-heading] * { color: #000 !important; }
  [data-board] tr { break-inside: avoid; }
}
`;

/** Adds the board's print rules to the page while the board is shown. */
export function BoardPrintStyles() {
  return <style>{PRINT_CSS}</style>;
}
