/**
 * The run view's right column: the shown result's profile and wall numbers as the run goes on (plain SVG while
 * live, the plotly panel once final). Built from the results' panels; kept here because only the run view shows it.
 */
import { LiveProfilePanel } from '../results/LiveProfilePanel';
import { ProfilePanel } from '../results/ProfilePanel';
import { WallNumbersCard } from '../results/WallNumbersCard';
import { useShownResult } from '../results/useResult';

export function LiveProfile() {
  const { entry, live } = useShownResult();
  if (!entry)
    return (
      <section className="panel">
        <p className="hint">Live profiles appear here once the replicas have sampled.</p>
      </section>
    );
  return (
    <div className="results">
      {live ? <LiveProfilePanel result={entry.result} /> : <ProfilePanel result={entry.result} live={false} />}
      <WallNumbersCard result={entry.result} />
    </div>
  );
}
