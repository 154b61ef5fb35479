/** The caution every page shows. */
export function Footer() {
  return (
    <footer className="footer" role="note" data-testid="caution">
      Results are model estimates. Check them against measurement before relying on them. Local codes, standards and
      licensed engineering practice govern vacuum vessels, pressure equipment and hazardous gases; Tenuis does not
      assess structural integrity, leak tightness or exposure.
    </footer>
  );
}
