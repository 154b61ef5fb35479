// Placeholder until the workbench interface lands.
import { QuickCheck } from './QuickCheck';

export function App() {
  return (
    <main style={{ maxWidth: '42rem', margin: '3rem auto', padding: '0 1rem', fontFamily: 'system-ui, sans-serif', lineHeight: 1.5 }}>
      <h1>Tenuis — rarefied gas workbench</h1>
      <p>
        The workbench interface is being built. Until it lands, run cases from the command line:{' '}
        <code>npx tenuis preset couette &gt; case.json</code>, then <code>npx tenuis run case.json --out results</code>
      </p>
      <QuickCheck />
      <p role="note" data-testid="caution">
        Results are model estimates. Verify them against measurement, and defer to local codes, standards and licensed
        engineering practice for vacuum vessels, pressurised parts and toxic gases.
      </p>
    </main>
  );
}
