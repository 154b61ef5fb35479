// Presets given pressures instead of a Knudsen number (issue 12, "Pressures, not only Knudsen numbers"): the case
// built from the pressures a Knudsen number gives is that Knudsen number's case, up to round-off; giving both ways
// is refused with a message naming both; the command line takes the pressures with units.
//
// Tolerance: the pressures → Kn → pressures round trip is a handful of floating-point operations (a product, a
// square root, a division), so numbers agree to a relative 1e-12 (a few hundred ulps, common practice, no source);
// Pa → mbar → Pa and Pa → Torr → Pa add one multiplication each. Names and descriptions are compared apart, since
// they show the derived number rounded.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { buildPreset, gasStateOfPresetCase } from '../../engine/case/presets';
import type { CaseInput } from '../../engine/case/schema';
import { PA_PER_TORR } from '../../engine/units/engineeringUnits';

const VESSEL_PRESETS = ['channel', 'tube', 'slit', 'orifice'];
const GAP_PRESETS = ['couette', 'fourier', 'poiseuille', 'cavity'];
const RELATIVE = 1e-12;

/** Every number of a and b equal to a relative RELATIVE; strings and structure exactly (name, description left out). */
function expectSameCase(a: CaseInput, b: CaseInput, where: string): void {
  const walk = (x: unknown, y: unknown, path: string): void => {
    if (typeof x === 'number' && typeof y === 'number') {
      if (Math.abs(x - y) > RELATIVE * Math.max(Math.abs(x), Math.abs(y)))
        expect.fail(`${where}: ${path} is ${y}, expected ${x}`);
      return;
    }
    if (x !== null && typeof x === 'object') {
      expect(typeof y, `${where}: ${path}`).toBe('object');
      const keys = new Set([...Object.keys(x), ...Object.keys(y as object)]);
      for (const k of keys) walk((x as never)[k], (y as never)[k], `${path}.${k}`);
      return;
    }
    expect(y, `${where}: ${path}`).toBe(x);
  };
  const strip = (c: CaseInput) => ({ ...c, name: '', description: '' });
  walk(strip(a), strip(b), 'case');
}

const full = (x: number) => x.toPrecision(17);

describe('presets between vessels from pressures', () => {
  for (const name of VESSEL_PRESETS) {
    it(`${name}: upstreamPressure/downstreamPressure (Pa, mbar, Torr) and meanPressure give the knudsen/pressureRatio case`, () => {
      const byKn = buildPreset(name, { knudsen: '0.2', pressureRatio: '3', gas: 'N2' });
      const state = gasStateOfPresetCase(byKn)!;
      const up = state.upstreamPressurePa!;
      const down = state.downstreamPressurePa!;
      expect(up / down).toBeCloseTo(3, 12);
      expectSameCase(
        byKn,
        buildPreset(name, { upstreamPressure: `${full(up)} Pa`, downstreamPressure: `${full(down)}Pa`, gas: 'N2' }),
        `${name} Pa`,
      );
      expectSameCase(
        byKn,
        buildPreset(name, {
          upstreamPressure: `${full(up / 100)}mbar`,
          downstreamPressure: `${full(down / 100)} mbar`,
          gas: 'N2',
        }),
        `${name} mbar`,
      );
      expectSameCase(
        byKn,
        buildPreset(name, {
          upstreamPressure: `${full(up / PA_PER_TORR)} Torr`,
          downstreamPressure: `${full(down / PA_PER_TORR)} Torr`,
          gas: 'N2',
        }),
        `${name} Torr`,
      );
      expectSameCase(
        byKn,
        buildPreset(name, { meanPressure: `${full(state.pressurePa)} Pa`, pressureRatio: '3', gas: 'N2' }),
        `${name} meanPressure`,
      );
    });
  }

  it('the derived Knudsen number is in the name and the description, and the pressures as given', () => {
    const c = buildPreset('tube', { upstreamPressure: '3Pa', downstreamPressure: '1Pa' });
    const state = gasStateOfPresetCase(c)!;
    expect(c.boundaries.left).toMatchObject({ type: 'reservoir', pressurePa: 3 });
    expect(c.boundaries.right).toMatchObject({ type: 'reservoir', pressurePa: 1 });
    expect(c.initial.pressurePa).toBe(2);
    const kn = String(Number(state.knudsen.toPrecision(4)));
    expect(c.name).toBe(`tube Ar Kn ${kn} ratio 3`);
    expect(c.description).toContain(`between vessels at 3 Pa and 1 Pa, Kn = ${kn} at the mean pressure`);
  });

  it('refuses two ways at once, naming the parameters', () => {
    expect(() => buildPreset('tube', { knudsen: '1', upstreamPressure: '3Pa', downstreamPressure: '1Pa' })).toThrow(
      /knudsen and upstreamPressure and downstreamPressure were both given/,
    );
    expect(() => buildPreset('channel', { knudsen: '1', meanPressure: '2Pa' })).toThrow(
      /knudsen and meanPressure were both given/,
    );
    expect(() =>
      buildPreset('slit', { meanPressure: '2Pa', upstreamPressure: '3Pa', downstreamPressure: '1Pa' }),
    ).toThrow(/meanPressure and upstreamPressure and downstreamPressure/);
    expect(() => buildPreset('tube', { upstreamPressure: '3Pa' })).toThrow(/upstreamPressure needs downstreamPressure/);
    expect(() => buildPreset('tube', { downstreamPressure: '3Pa' })).toThrow(
      /downstreamPressure needs upstreamPressure/,
    );
    expect(() =>
      buildPreset('tube', { upstreamPressure: '3Pa', downstreamPressure: '1Pa', pressureRatio: '2' }),
    ).toThrow(/pressureRatio and upstreamPressure and downstreamPressure were all given/);
    expect(() => buildPreset('orifice', { upstreamPressure: '1Pa', downstreamPressure: '3Pa' })).toThrow(
      /upstreamPressure \(1 Pa\) must be above downstreamPressure \(3 Pa\)/,
    );
    expect(() => buildPreset('tube', { upstreamPressure: '3 degC', downstreamPressure: '1Pa' })).toThrow(
      /parameter upstreamPressure: unknown pressure unit/,
    );
  });
});

describe('gap presets from a pressure', () => {
  for (const name of GAP_PRESETS) {
    it(`${name}: pressure (Pa, mbar, Torr) gives the knudsen case`, () => {
      const byKn = buildPreset(name, { knudsen: '0.3', gas: 'He' });
      const p = gasStateOfPresetCase(byKn)!.pressurePa;
      expectSameCase(byKn, buildPreset(name, { pressure: `${full(p)} Pa`, gas: 'He' }), `${name} Pa`);
      expectSameCase(byKn, buildPreset(name, { pressure: `${full(p / 100)} mbar`, gas: 'He' }), `${name} mbar`);
      expectSameCase(byKn, buildPreset(name, { pressure: `${full(p / PA_PER_TORR)}Torr`, gas: 'He' }), `${name} Torr`);
    });
  }

  it('the description names the given pressure and the derived Knudsen number', () => {
    const c = buildPreset('couette', { pressure: '0.1 mbar' });
    const kn = Number(gasStateOfPresetCase(c)!.knudsen.toPrecision(4));
    expect(c.initial.pressurePa).toBe(10);
    expect(c.description).toContain(`Kn = ${kn}, from the pressure 10 Pa`);
  });

  it('refuses knudsen and pressure together, naming both', () => {
    for (const name of GAP_PRESETS)
      expect(() => buildPreset(name, { knudsen: '0.1', pressure: '10Pa' }), name).toThrow(
        /knudsen and pressure were both given/,
      );
  });
});

describe('tenuis preset with pressures', () => {
  const cli = join(fileURLToPath(new URL('../..', import.meta.url)), 'dist-cli', 'tenuis.mjs');
  const tenuis = (...args: string[]) => spawnSync(process.execPath, [cli, 'preset', ...args], { encoding: 'utf8' });

  it('`preset tube --set upstreamPressure=3Pa --set downstreamPressure=1Pa` is the knudsen/pressureRatio case', () => {
    const r = tenuis('tube', '--set', 'upstreamPressure=3Pa', '--set', 'downstreamPressure=1Pa');
    expect(r.status, r.stderr).toBe(0);
    const byPressures = JSON.parse(r.stdout) as CaseInput;
    const kn = gasStateOfPresetCase(byPressures)!.knudsen;
    const k = tenuis('tube', '--set', `knudsen=${full(kn)}`, '--set', 'pressureRatio=3');
    expect(k.status, k.stderr).toBe(0);
    expectSameCase(JSON.parse(k.stdout) as CaseInput, byPressures, 'tube from the command line');
    const mbar = tenuis('tube', '--set', 'upstreamPressure=0.03mbar', '--set', 'downstreamPressure=0.01mbar');
    expectSameCase(byPressures, JSON.parse(mbar.stdout) as CaseInput, 'tube in mbar');
    const torr = tenuis(
      'tube',
      '--set',
      `upstreamPressure=${full(3 / PA_PER_TORR)}Torr`,
      '--set',
      `downstreamPressure=${full(1 / PA_PER_TORR)}Torr`,
    );
    expectSameCase(byPressures, JSON.parse(torr.stdout) as CaseInput, 'tube in Torr');
  });

  it('refuses knudsen with pressures, naming both, and documents the alternatives in --help', () => {
    const r = tenuis('tube', '--set', 'knudsen=1', '--set', 'upstreamPressure=3Pa', '--set', 'downstreamPressure=1Pa');
    expect(r.status).not.toBe(0);
    expect(r.stderr).toMatch(/knudsen and upstreamPressure and downstreamPressure were both given/);
    const help = tenuis('tube', '--help');
    expect(help.stdout).toMatch(/upstreamPressure and downstreamPressure +the two vessel pressures/);
    expect(help.stdout).toMatch(/At the defaults, knudsen=0\.5 gives upstreamPressure=[\d.]+ Pa, downstreamPressure=/);
    expect(tenuis('couette', '--help').stdout).toMatch(/knudsen=0\.1 gives pressure=[\d.]+ Pa/);
  });
});
