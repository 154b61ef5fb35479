/**
 * The Long duct view's answer: the results card (each number with its 95 % half-width from the table's), the warnings,
 * the pressure and Knudsen number along the duct, the conductance curve beside the no-slip, first-order slip and
 * free-molecular lines, and the downloads (summary.json, duct.csv, conductance.csv as `tenuis duct` writes them).
 */
import { useMemo } from 'react';
import { setupApi } from '../bridge/loadEngine';
import type { LongDuctApi } from '../bridge/types';
import type { LongDuctAnswer, LongDuctRequest } from '../../engine/report/longDuctReport';
import type { Estimate } from '../../engine/longDuct/isothermalDuct';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import { downloadText } from '../io/download';
import type { LongDuctFormState } from './longDuctForm';

export interface LongDuctResultsProps {
  readonly api: LongDuctApi;
  readonly request: LongDuctRequest;
  readonly curve: { readonly fromPa: number; readonly toPa: number; readonly points: number } | null;
  readonly form: LongDuctFormState;
}

type Solved = { ok: true; answer: LongDuctAnswer } | { ok: false; message: string };

function solve(api: LongDuctApi, request: LongDuctRequest): Solved {
  try {
    return { ok: true, answer: api.longDuctAnswer(request) };
  } catch (e) {
    return { ok: false, message: (e as Error).message };
  }
}

export function LongDuctResults({ api, request, curve, form }: LongDuctResultsProps) {
  const setup = setupApi();
  const solved = useMemo(() => solve(api, request), [api, request]);
  const profile = useMemo(
    () => (solved.ok && solved.answer.kind === 'flow' ? api.longDuctProfile(request, solved.answer.result) : null),
    [api, request, solved],
  );
  const curvePoints = useMemo(() => {
    if (!curve || !solved.ok || solved.answer.kind !== 'flow') return null;
    const s = solved.answer.summary;
    const ratio = s.downstream.pressure / s.upstream.pressure;
    if (!(ratio > 0 && ratio < 1) || request.upstreamTemperatureK !== request.downstreamTemperatureK) return null;
    try {
      return api.longDuctConductanceCurve({
        geometry: request.geometry,
        species: request.species,
        table: request.table,
        temperatureK: request.upstreamTemperatureK,
        upstreamPressuresPa: api.pressureRange(curve.fromPa, curve.toPa, curve.points, true),
        ratio,
      });
    } catch {
      return null;
    }
  }, [api, request, curve, solved]);

  if (!solved.ok)
    return (
      <section className="panel" aria-labelledby="long-duct-results-title">
        <h2 id="long-duct-results-title">Results</h2>
        <p className="message message-error" role="alert" data-testid="long-duct-errors">
          {solved.message}
        </p>
      </section>
    );
  const { summary } = solved.answer;
  const mass = setup.SPECIES[request.species].massKg;
  const perWidth = request.geometry.shape === 'channel' && form.width.text.trim() === '';
  const per = perWidth ? ' per metre of width' : '';
  const pUnit = form.mode === 'pump' ? 'Pa' : form.upstreamPressure.unit;
  const shown = (e: Estimate, unit: string) =>
    `${setup.formatQuantity(e.mean, unit, 4, { molecularMassKg: mass })} ± ${setup.formatQuantity(e.ci95, unit, 2, { molecularMassKg: mass })}`;
  const given = (v: number) => `${setup.formatQuantity(v, pUnit, 4)} (given)`;
  const pressureRow = (v: number, ci95: number) => (ci95 > 0 ? shown({ mean: v, ci95 }, pUnit) : given(v));
  const a = solved.answer;
  const rows: [string, string][] = [
    [
      a.kind === 'pumped' ? 'chamber (upstream) pressure' : 'upstream pressure',
      pressureRow(
        summary.upstream.pressure,
        a.kind === 'flow' ? a.result.upstreamPressurePa.ci95 : a.result.chamberPressurePa.ci95,
      ),
    ],
    [
      a.kind === 'pumped' ? 'pump inlet pressure' : 'downstream pressure',
      pressureRow(summary.downstream.pressure, a.kind === 'flow' ? a.result.downstreamPressurePa.ci95 : 0),
    ],
    [
      'Knudsen number, up → down',
      `${summary.upstream.knudsen.toPrecision(3)} → ${summary.downstream.knudsen.toPrecision(3)}`,
    ],
    [`mass flow${per}`, `${shown(summary.flow.massFlowRate, 'kg/s')} (${shown(summary.flow.massFlowRate, 'sccm')})`],
    [`throughput${per}`, shown(summary.flow.throughput, 'mbar·L/s')],
  ];
  if (summary.flow.conductance) rows.push([`conductance${per}`, shown(summary.flow.conductance, 'L/s')]);
  if (summary.flow.transmissionProbability)
    rows.push([
      'transmission probability',
      `${summary.flow.transmissionProbability.mean.toPrecision(4)} ± ${summary.flow.transmissionProbability.ci95.toPrecision(2)}`,
    ]);
  if (summary.flow.effectivePumpingSpeed)
    rows.push(['effective pumping speed at the chamber', shown(summary.flow.effectivePumpingSpeed, 'L/s')]);
  const base = `long-${request.geometry.shape}`;
  return (
    <>
      <section className="panel" aria-labelledby="long-duct-results-title">
        <h2 id="long-duct-results-title">Results</h2>
        <table className="kv" data-testid="long-duct-numbers">
          <tbody>
            {rows.map(([k, v]) => (
              <tr key={k}>
                <th scope="row">{k}</th>
                <td>{v}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="hint">
          ± is the 95 % half-width carried from the coefficient table&apos;s; the long-duct model neglects the ends and
          assumes locally fully developed flow.
        </p>
        {summary.warnings.length > 0 && (
          <ul className="warnings" data-testid="long-duct-warnings">
            {summary.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        )}
        <div className="actions">
          <button
            type="button"
            onClick={() =>
              downloadText(`${base}-summary.json`, `${JSON.stringify(summary, null, 2)}\n`, 'application/json')
            }
          >
            Download summary.json
          </button>
          {profile && (
            <button
              type="button"
              onClick={() =>
                downloadText(`${base}-duct.csv`, api.longDuctProfileCsv(profile), 'text/csv;charset=utf-8')
              }
            >
              Download duct.csv
            </button>
          )}
          {curvePoints && (
            <button
              type="button"
              onClick={() =>
                downloadText(`${base}-conductance.csv`, api.conductanceCurveCsv(curvePoints), 'text/csv;charset=utf-8')
              }
            >
              Download conductance.csv
            </button>
          )}
        </div>
      </section>
      {profile && <ProfilePlot profile={profile} pressureUnit={pUnit} lengthUnit={form.length.unit} />}
      {curvePoints && <CurvePlot points={curvePoints} pressureUnit={form.curveFrom.unit} per={per} />}
    </>
  );
}

function ProfilePlot({
  profile,
  pressureUnit,
  lengthUnit,
}: {
  profile: ReturnType<LongDuctApi['longDuctProfile']>;
  pressureUnit: string;
  lengthUnit: string;
}) {
  const setup = setupApi();
  const data = useMemo((): Data[] => {
    const x = profile.xM.map((v) => setup.convertFromSI(v, lengthUnit));
    return [
      {
        type: 'scatter',
        mode: 'lines',
        name: `pressure [${pressureUnit}]`,
        x,
        y: profile.pressurePa.map((p) => setup.convertFromSI(p, pressureUnit)),
      },
      {
        type: 'scatter',
        mode: 'lines',
        name: 'Knudsen number [1]',
        x,
        y: profile.knudsen,
        yaxis: 'y2',
        line: { dash: 'dash' },
      },
    ];
  }, [profile, pressureUnit, lengthUnit, setup]);
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: { title: { text: `position along the duct x [${lengthUnit}]` } },
      yaxis: { title: { text: `pressure [${pressureUnit}]` }, exponentformat: 'power' },
      yaxis2: {
        title: { text: 'Knudsen number [1]' },
        overlaying: 'y',
        side: 'right',
        type: 'log',
        exponentformat: 'power',
      },
      legend: { orientation: 'h', y: -0.22 },
      margin: { r: 90 },
      height: 380,
    }),
    [pressureUnit, lengthUnit],
  );
  return (
    <section className="panel" aria-labelledby="long-duct-profile-title">
      <h2 id="long-duct-profile-title">Pressure and Knudsen number along the duct</h2>
      <Plot
        data={data}
        layout={layout}
        filename="long-duct-pressure"
        label="pressure along the duct"
        testId="long-duct-profile-plot"
      />
    </section>
  );
}

function CurvePlot({
  points,
  pressureUnit,
  per,
}: {
  points: ReturnType<LongDuctApi['longDuctConductanceCurve']>;
  pressureUnit: string;
  per: string;
}) {
  const setup = setupApi();
  const data = useMemo((): Data[] => {
    const x = points.map((p) => setup.convertFromSI(p.meanPressurePa, pressureUnit));
    const ls = (v: number) => setup.convertFromSI(v, 'L/s');
    const lines: Data[] = [
      {
        type: 'scatter',
        mode: 'lines',
        name: 'Tenuis DSMC table (95 % band)',
        x,
        y: points.map((p) => ls(p.conductanceM3PerS.mean)),
        error_y: { type: 'data', array: points.map((p) => ls(p.conductanceM3PerS.ci95)), visible: true },
      },
      {
        type: 'scatter',
        mode: 'lines',
        name: 'no-slip continuum',
        x,
        y: points.map((p) => ls(p.noSlipM3PerS)),
        line: { dash: 'dot' },
      },
      {
        type: 'scatter',
        mode: 'lines',
        name: 'first-order slip',
        x,
        y: points.map((p) => ls(p.firstOrderSlipM3PerS)),
        line: { dash: 'dash' },
      },
    ];
    if (points.every((p) => Number.isFinite(p.freeMolecularM3PerS)))
      lines.push({
        type: 'scatter',
        mode: 'lines',
        name: 'free-molecular',
        x,
        y: points.map((p) => ls(p.freeMolecularM3PerS)),
        line: { dash: 'dashdot' },
      });
    return lines;
  }, [points, pressureUnit, setup]);
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: { title: { text: `mean pressure [${pressureUnit}]` }, type: 'log', exponentformat: 'power' },
      yaxis: { title: { text: `conductance [L/s]${per}` }, type: 'log', exponentformat: 'power' },
      legend: { orientation: 'h', y: -0.22 },
      height: 400,
    }),
    [pressureUnit, per],
  );
  return (
    <section className="panel" aria-labelledby="long-duct-curve-plot-title">
      <h2 id="long-duct-curve-plot-title">Conductance from viscous to molecular flow</h2>
      <Plot
        data={data}
        layout={layout}
        filename="long-duct-conductance"
        label="conductance curve"
        testId="long-duct-curve-plot"
      />
    </section>
  );
}
