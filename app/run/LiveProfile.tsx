/**
 * The run view's right column: the shown result's profile and wall numbers as the run goes on (plain SVG while
 * live, the plotly panel once final). Built from the results' panels; kept here because only the run view shows it.
 */
import { useMemo } from 'react';
import { runApiIfLoaded } from '../bridge/loadEngine';
import { LiveProfilePanel } from '../results/LiveProfilePanel';
import { ProfilePanel } from '../results/ProfilePanel';
import { WallNumbersCard } from '../results/WallNumbersCard';
import { useShownResult } from '../results/useResult';

export function LiveProfile() {
  const { entry, live } = useShownResult();
  // Walls and blocks of the case, so the live cut is the one the final profile starts on.
  const geometry = useMemo(
    () => (entry ? (runApiIfLoaded()?.resultGeometryOf(entry.caseInput) ?? null) : null),
    [entry?.caseInput],
  );
  if (!entry)
    return (
      <section className="panel">
        <p className="hint">Live profiles appear here once the replicas have sampled.</p>
      </section>
    );
  return (
    <div className="results">
      {live ? (
        <LiveProfilePanel result={entry.result} geometry={geometry} />
      ) : (
        <ProfilePanel result={entry.result} live={false} geometry={geometry} />
      )}
      <WallNumbersCard result={entry.result} />
    </div>
  );
}
