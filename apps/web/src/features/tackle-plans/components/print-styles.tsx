/**
 * Print rules for the plan card: only the card prints, on one A4 or letter page, without the site's
 * header, navigation and footer. Scoped to the plan screen by being rendered only there.
 */
const PRINT_CSS = `
@media print {
  @page { size: auto; margin: 12mm; }
  #root > div > header, #root > div > footer, #root > div > a { display: none !important; }
  #root main { padding: 0 !important; }
  #root main h1 { display: none !important; }
  html, body { background: #fff !important; }
  [data-plan-card] { box-shadow: none !important; border: 1px solid #000 !important; break-inside: avoid; font-size: 10.5pt; }
  [data-plan-card] * { color: #000 !important; }
}
`;

/** Adds the plan card's print rules to the page while the plan screen is shown. */
export function PrintStyles() {
  return <style>{PRINT_CSS}</style>;
}
