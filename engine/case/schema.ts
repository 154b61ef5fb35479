/**
 * The case file: what a user (form, file or preset) asks Tenuis to simulate.
 *
 * All quantities are SI and their names carry the unit (`pressurePa`, `lengthYM`), so a file read without the
 * documentation cannot be misunderstood. Engineering units (mbar, Torr, µm, °C …) are converted at the edges (UI,
 * command line), never here. Validation happens once, here; everything downstream trusts a parsed `Case`.
 */
import { z } from 'zod';
import { SIDE_NAMES, type SideName } from './caseConstants';
import { caseShape } from './caseShape';
import { checkGeometry } from './checkGeometry';

export const caseSchema = caseShape.check((ctx) => {
  const b = ctx.value.boundaries;
  const pairs: [SideName, SideName][] = [
    ['left', 'right'],
    ['bottom', 'top'],
  ];
  for (const [a, c] of pairs) {
    if ((b[a].type === 'periodic') !== (b[c].type === 'periodic')) {
      ctx.issues.push({
        code: 'custom',
        input: b,
        message: `periodic boundaries come in pairs: set both ${a} and ${c} to periodic, or neither`,
        path: ['boundaries', b[a].type === 'periodic' ? c : a],
      });
    }
  }
  for (const side of SIDE_NAMES) {
    const s = b[side];
    if (s.type !== 'wall') continue;
    const normalIndex = side === 'left' || side === 'right' ? 0 : 1;
    if (s.velocityMPerS[normalIndex] !== 0) {
      ctx.issues.push({
        code: 'custom',
        input: s,
        message: `the ${side} wall may only move along itself: its ${normalIndex === 0 ? 'x' : 'y'} velocity must be 0`,
        path: ['boundaries', side, 'velocityMPerS'],
      });
    }
  }
  checkGeometry(ctx.value, (message, path) => ctx.issues.push({ code: 'custom', input: ctx.value, message, path }));
});

export type CaseInput = z.input<typeof caseSchema>;
export type Case = z.output<typeof caseSchema>;
export type BoundarySpec = Case['boundaries'][SideName];
export type WallSpec = Extract<BoundarySpec, { type: 'wall' }>;
export type ReservoirSpec = Extract<BoundarySpec, { type: 'reservoir' }>;
export type BlockSpec = Case['blocks'][number];
export type FlowSectionSpec = Case['flowSections'][number];
export type FlowReportSpec = NonNullable<Case['flowReport']>;

export type CaseParseResult = { ok: true; value: Case } | { ok: false; errors: string[] };

/** Validates untrusted JSON (already parsed, never evaluated) and returns messages that name the field. */
export function parseCase(input: unknown): CaseParseResult {
  const r = caseSchema.safeParse(input);
  if (r.success) return { ok: true, value: r.data };
  return {
    ok: false,
    errors: r.error.issues.map((i) => `${i.path.length ? i.path.join('.') : '(case)'}: ${i.message}`),
  };
}

/** JSON Schema of the case file (draft 2020-12), for editors and for `tenuis schema`. */
export function caseJsonSchema(): unknown {
  return z.toJSONSchema(caseSchema, { io: 'input', unrepresentable: 'any' });
}
