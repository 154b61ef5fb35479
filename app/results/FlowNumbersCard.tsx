/**
 * The flow numbers of a case with flow sections (flowNumbers.ts), mean ± 95 % half-width with their units, and what
 * they refer to; nothing is shown, and nothing is made up, for a result without them. Each number with a unit has a
 * selector of the units vacuum practice quotes it in (engine/units/flowUnits.ts through the run API); the choice is
 * kept per quantity in the saved settings, and the SI value stays beside a converted one so both can be read.
 */
import type { FlowEstimate, FlowNumbers, FlowUnitChoices } from './flowNumbers';
import type { FlowUnitQuantity } from '../../engine/units/flowUnits';
import { estimateText } from '../format';
import { appStore, useApp } from '../store/appStore';

export function FlowNumbersCard({ flow, choices }: { flow: FlowNumbers; choices: FlowUnitChoices | null }) {
  const chosenUnits = useApp((s) => s.flowUnits);
  if (!flow.rows.length) return null;
  return (
    <section className="panel" aria-labelledby="flow-title" data-testid="flow-numbers">
      <h2 id="flow-title">Flow numbers (mean ± 95 % half-width)</h2>
      {flow.context && <p className="hint">{flow.context}</p>}
      <table className="kv">
        <tbody>
          {flow.rows.map((f) => (
            <FlowRow key={f.name} row={f} choices={choices} chosen={chosenUnits[f.name]} planar={flow.planar} />
          ))}
        </tbody>
      </table>
    </section>
  );
}

function FlowRow({
  row,
  choices,
  chosen,
  planar,
}: {
  row: FlowEstimate;
  choices: FlowUnitChoices | null;
  chosen: string | undefined;
  planar: boolean;
}) {
  const options = choices && row.name in choices ? choices[row.name as FlowUnitQuantity] : undefined;
  const choice = options?.find((c) => c.unit === chosen) ?? options?.[0];
  const per = planar ? '/m' : '';
  const isEngineUnit = !choice || choice.engineUnitsPerUnit === 1;
  return (
    <tr>
      <th scope="row">
        {row.label}
        {/* The unit shown in brackets as everywhere (SI in the engine's spelling), the selector beside it. */}
        {isEngineUnit ? (row.unit ? ` [${row.unit}]` : '') : ` [${choice.unit}${per}]`}
        {options && choice && (
          <>
            {' '}
            <select
              aria-label={`unit of the ${row.label}`}
              data-testid={`flow-unit-${row.name}`}
              value={choice.unit}
              onChange={(e) => appStore.getState().setFlowUnit(row.name, e.target.value)}
            >
              {options.map((c) => (
                <option key={c.unit} value={c.unit}>
                  {c.unit}
                  {per}
                </option>
              ))}
            </select>
          </>
        )}
      </th>
      <td>
        <span data-testid={`flow-value-${row.name}`}>
          {choice
            ? estimateText(row.mean / choice.engineUnitsPerUnit, row.ci95 / choice.engineUnitsPerUnit)
            : estimateText(row.mean, row.ci95)}
        </span>
        {!isEngineUnit && (
          <span className="hint" data-testid={`flow-si-${row.name}`}>
            {' '}
            ({estimateText(row.mean, row.ci95)} {row.unit})
          </span>
        )}
      </td>
    </tr>
  );
}
