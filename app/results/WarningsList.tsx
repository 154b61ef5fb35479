/** Warnings of a result (advisor, statistics, lost replicas, stopped early). */
export function WarningsList({ warnings }: { warnings: readonly string[] }) {
  if (!warnings.length) return null;
  return (
    <section className="panel" aria-labelledby="warnings-title">
      <h2 id="warnings-title">Warnings</h2>
      <ul className="warnings" data-testid="result-warnings">
        {warnings.map((w) => (
          <li key={w}>⚠ {w}</li>
        ))}
      </ul>
    </section>
  );
}
