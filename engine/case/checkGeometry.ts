/**
 * The case's geometric checks, which span several fields: blocks inside the domain and apart from each other, names
 * unique, flow sections inside the domain, and the rules of an axisymmetric domain. Reports every problem it finds
 * (with the path of the field to fix) rather than stopping at the first.
 */
import type { CaseDraft } from './caseShape';
import { BLOCK_FACES, SIDE_NAMES } from './caseConstants';

export type Report = (message: string, path: (string | number)[]) => void;

/** Blocks inside the domain, names unique, sections inside it, and the axisymmetric rules. */
export function checkGeometry(c: CaseDraft, report: Report): void {
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const axisymmetric = c.domain.geometry === 'axisymmetric';
  const b = c.boundaries;
  const names = new Set<string>(SIDE_NAMES);
  for (const side of SIDE_NAMES) {
    const s = b[side];
    if (s.type !== 'wall' || s.name === undefined || s.name === side) continue;
    if (names.has(s.name) || (SIDE_NAMES as readonly string[]).includes(s.name))
      report(`wall name "${s.name}" is already used; give each wall its own name`, ['boundaries', side, 'name']);
    names.add(s.name);
  }
  c.blocks.forEach((k, i) => {
    const at = ['blocks', i];
    if (names.has(k.name))
      report(`block name "${k.name}" is used twice (or is a side's name); give each block its own name`, [
        ...at,
        'name',
      ]);
    names.add(k.name);
    if (!(k.xMaxM > k.xMinM))
      report(`block ${k.name}: xMaxM (${k.xMaxM}) must be greater than xMinM (${k.xMinM})`, [...at, 'xMaxM']);
    if (!(k.yMaxM > k.yMinM))
      report(`block ${k.name}: yMaxM (${k.yMaxM}) must be greater than yMinM (${k.yMinM})`, [...at, 'yMaxM']);
    if (k.xMaxM > lx)
      report(`block ${k.name}: xMaxM (${k.xMaxM} m) lies outside the domain (lengthXM = ${lx} m)`, [...at, 'xMaxM']);
    if (k.yMaxM > ly)
      report(`block ${k.name}: yMaxM (${k.yMaxM} m) lies outside the domain (lengthYM = ${ly} m)`, [...at, 'yMaxM']);
    if (k.wall.velocityMPerS.some((v) => v !== 0))
      report(
        `block ${k.name}: give a moving face its speed in faces.NAME, not in wall (the faces of a block point in different directions)`,
        [...at, 'wall', 'velocityMPerS'],
      );
    BLOCK_FACES.forEach((face, f) => {
      const w = k.faces?.[face];
      const normalIndex = f < 2 ? 0 : 1;
      if (w && w.velocityMPerS[normalIndex] !== 0)
        report(
          `block ${k.name}: face ${face} may only move along itself: its ${normalIndex === 0 ? 'x' : 'y'} velocity must be 0`,
          [...at, 'faces', face, 'velocityMPerS'],
        );
    });
  });
  c.flowSections.forEach((s, i) => {
    const at = ['flowSections', i];
    if (names.has(s.name))
      report(`flow section name "${s.name}" is already used by a side, block or section; give it its own name`, [
        ...at,
        'name',
      ]);
    names.add(s.name);
    if (!(s.xM > 0 && s.xM < lx))
      report(`flow section ${s.name}: xM (${s.xM} m) must lie inside the domain, between 0 and lengthXM = ${lx} m`, [
        ...at,
        'xM',
      ]);
    if ((s.yMaxM ?? ly) <= (s.yMinM ?? 0) || (s.yMaxM ?? 0) > ly)
      report(`flow section ${s.name}: need 0 ≤ yMinM < yMaxM ≤ lengthYM (${ly} m)`, [...at, 'yMaxM']);
  });
  if (c.flowReport?.section !== undefined && !c.flowSections.some((s) => s.name === c.flowReport!.section)) {
    report(
      `flowReport.section "${c.flowReport.section}" is not one of the flowSections (${c.flowSections.map((s) => s.name).join(', ') || 'none defined'})`,
      ['flowReport', 'section'],
    );
  }
  if (c.flowReport && c.flowSections.length === 0)
    report('flowReport needs at least one entry in flowSections to count the flow through', ['flowReport']);
  for (const side of SIDE_NAMES) {
    if (b[side].type === 'axis' && (!axisymmetric || side !== 'bottom'))
      report('only the bottom side of an axisymmetric domain can be the axis', ['boundaries', side, 'type']);
    if (b[side].type === 'pressureOutlet' && side !== 'left' && side !== 'right')
      report('a pressureOutlet ends a duct along x: use it on the left or right side', ['boundaries', side, 'type']);
  }
  if (axisymmetric && (c.bodyAccelerationZMPerS2 ?? 0) !== 0)
    report(
      'bodyAccelerationZMPerS2: z is the swirl direction of an axisymmetric domain; a cross-section driven along the duct needs a planar domain',
      ['bodyAccelerationZMPerS2'],
    );
  if (axisymmetric) {
    if (b.bottom.type !== 'axis')
      report(
        'in an axisymmetric domain the bottom side (y = 0) is the axis: set boundaries.bottom to {"type": "axis"}',
        ['boundaries', 'bottom', 'type'],
      );
    if (b.top.type === 'periodic')
      report('the outer side of an axisymmetric domain cannot be periodic', ['boundaries', 'top', 'type']);
    for (const side of SIDE_NAMES) {
      const s = b[side];
      if ((s.type === 'wall' || s.type === 'reservoir') && s.velocityMPerS[2] !== 0)
        report(`${side}: swirl (z velocity) is not modelled in axisymmetric domains; set it to 0`, [
          'boundaries',
          side,
          'velocityMPerS',
        ]);
    }
  }
}
