/** The result of a run (live or finished): numbers, warnings, comparison, plots and exports. */
import { useMemo } from 'react';
import { flowNumbersOf } from './flowNumbers';
import { runApiIfLoaded } from '../bridge/loadEngine';
import { useComparedResult, useShownResult } from './useResult';
import { countText, durationText } from '../format';
import { WallNumbersCard } from './WallNumbersCard';
import { FlowNumbersCard } from './FlowNumbersCard';
import { ComparisonCard } from './ComparisonCard';
import { comparisonView } from './comparisonView';
import { ProfilePanel } from './ProfilePanel';
import { FieldMapPanel } from './FieldMapPanel';
import { WallDistributionPanel } from './WallDistributionPanel';
import { ExportPanel } from './ExportPanel';
import { WarningsList } from './WarningsList';
import { CompareSelect } from './CompareSelect';
import { LiveProfilePanel } from './LiveProfilePanel';

export function ResultPanels() {
  const { entry, live, id } = useShownResult();
  const compared = useComparedResult();
  const flow = useMemo(() => {
    if (!entry) return null;
    return flowNumbersOf(
      entry.result,
      runApiIfLoaded()?.flowQuantityUnits(entry.result.flow?.perDepth ?? !entry.result.axisymmetric) ?? {},
    );
  }, [entry?.result]);
  const comparison = useMemo(() => {
    const api = runApiIfLoaded();
    const n = entry?.result.numerics;
    const sampled =
      api && n && entry?.performance
        ? api.sampledWallSeconds(entry.performance.wallSeconds, n.sampleSteps, n.steps)
        : NaN;
    return comparisonView(entry?.comparison, api, sampled);
  }, [entry?.comparison, entry?.performance]);
  const curves = useMemo(() => comparison?.curves ?? [], [comparison]);
  // Walls, blocks, no-gas cells and gas constants from the case's plan (null if the run API is not loaded).
  const geometry = useMemo(
    () => (entry ? (runApiIfLoaded()?.resultGeometryOf(entry.caseInput) ?? null) : null),
    [entry?.caseInput],
  );
  if (!entry || !flow) return <p className="hint">No result yet: run a case, or open a saved run.</p>;
  const r = entry.result;
  const n = r.numerics;
  if (live) {
    return (
      <div className="results" data-testid="results" data-result-id={id ?? ''}>
        <p className="note">
          The run is still going: these are live estimates. Plots, field maps and exports appear when it ends.
        </p>
        <LiveProfilePanel result={r} geometry={geometry} />
        <WallNumbersCard result={r} />
      </div>
    );
  }
  return (
    <div className="results" data-testid="results" data-result-id={id ?? ''}>
      <section className="panel" aria-labelledby="result-head">
        <h2 id="result-head">
          {entry.caseName}
          {live ? ' (live, run still going)' : ''}
        </h2>
        <p data-testid="result-facts">
          Kn = {r.reference.knudsen.toPrecision(4)}, {n.replicas} replica{n.replicas === 1 ? '' : 's'},{' '}
          {countText(n.sampleSteps)} sampled steps in all, {countText(n.particles)} particles at the end
          {entry.performance ? `, ${durationText(entry.performance.wallSeconds)} wall time` : ''}.
        </p>
        <CompareSelect />
      </section>
      <ComparisonCard view={comparison} />
      <FlowNumbersCard flow={flow} choices={runApiIfLoaded()?.FLOW_UNIT_CHOICES ?? null} />
      <WallNumbersCard result={r} />
      <WarningsList warnings={r.warnings} />
      <ProfilePanel
        result={r}
        live={live}
        compare={compared.entry ? { result: compared.entry.result, name: compared.name } : undefined}
        continuum={curves}
        geometry={geometry}
        exportName={entry.caseName}
      />
      {curves.length === 0 && (
        <p className="hint">
          No continuum overlay for this case{comparison && !comparison.recognised ? `: ${comparison.description}` : ''}.
        </p>
      )}
      <FieldMapPanel result={r} geometry={geometry} />
      <WallDistributionPanel result={r} geometry={geometry} />
      {!live && <ExportPanel entry={entry} />}
    </div>
  );
}
