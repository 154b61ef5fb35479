/**
 * The run panel's precision target, from what the user typed to what the run API takes. Plain data, no engine code
 * (the rule itself is engine/stats/stopping.ts, applied in the run chunk).
 */
import type { TargetSetting } from '../store/types';
import type { TargetRequest } from '../bridge/types';

export type TargetCheck =
  { readonly ok: true; readonly request: TargetRequest | undefined } | { readonly ok: false; readonly message: string };

/**
 * No target when no quantity is chosen, or when the chosen one is not among this case's quantities (a case changed
 * under the setting); otherwise the goal must be a percentage above 0 and at most 100.
 */
export function targetRequestOf(setting: TargetSetting, knownPaths: readonly string[]): TargetCheck {
  if (setting.path === '' || !knownPaths.includes(setting.path)) return { ok: true, request: undefined };
  const text = setting.goalPercent.trim().replace(/%$/, '').trim().replace('\u2212', '-');
  const value = text === '' ? Number.NaN : Number(text);
  if (!Number.isFinite(value))
    return { ok: false, message: `"${setting.goalPercent}" is not a number: give the goal as a percentage, e.g. 2` };
  if (!(value > 0 && value <= 100))
    return {
      ok: false,
      message: `a goal of ${setting.goalPercent} % is outside the allowed range: give a percentage above 0 and at most 100`,
    };
  return {
    ok: true,
    request: { path: setting.path, relativeHalfWidth: value / 100, stopWhenReached: setting.stopWhenReached },
  };
}
