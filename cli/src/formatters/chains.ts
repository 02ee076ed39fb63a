/** Text and JSON for `ligament chains`. Pure. */
import type { Chain, RankedChain } from '../engine/types.js';
import type { ChainsReport } from '../runner/chains.js';
import { formatQuantity, unitSymbol, type Dimension } from '../engine/index.js';
import type { UnitSystem } from '../engine/types.js';
import { chainLabel, columns } from './common.js';

/** A value with its unit, or (in a column or list headed by the unit) without. */
const q = (value: number, dimension: Dimension, units: UnitSystem) => formatQuantity(value, dimension, units);
const n = (value: number, dimension: Dimension, units: UnitSystem) =>
  formatQuantity(value, dimension, units, { unit: false });

function legLines(chain: Chain, units: UnitSystem): string[] {
  if (chain.legs.length === 0) return [];
  const rows = chain.legs.map((l) => [
    `${l.from} → ${l.to}`,
    `s ${q(l.s, 'length', units)}`,
    `g ${q(l.g, 'length', units)}`,
    `s²/4g ${q(l.term, 'length', units)}`,
  ]);
  return columns(rows, ['left', 'right', 'right', 'right']).map((l) => `        ${l}`);
}

function blocked(c: RankedChain): string {
  const parts: string[] = [];
  for (const d of c.admissible) parts.push(`${d}: forms`);
  for (const r of c.rejections) {
    parts.push(
      `${r.direction}: blocked by ${r.blockingHole} (${r.reason === 'on-line' ? 'on the fracture line' : 'on the loaded side'})`,
    );
  }
  return parts.join('; ');
}

/** The chains report as text. */
export function formatChainsText(report: ChainsReport): string {
  const units = report.profile?.units ?? 'in';
  const m = report.member;
  if (!m) return '';
  const out: string[] = [];
  out.push(
    `${report.file}  ${m.id}  PL ${n(m.thickness, 'length', units)} × ${q(m.width, 'length', units)}  ${m.holes.length} holes`,
  );
  if (report.holeWidths.length > 0) {
    out.push(
      `  hole widths deducted (${unitSymbol('length', units)}): ` +
        report.holeWidths.map((h) => `${h.holeId} ${n(h.deducted, 'length', units)}`).join('  '),
    );
  }
  for (const d of report.directions) {
    out.push('');
    out.push(
      `  direction ${d.direction}: ${d.least.length} least chain${d.least.length === 1 ? '' : 's'} that can form under the full load`,
    );
    if (d.least.length === 0) out.push('    none: no chain frees the loaded piece in this direction');
    const rows = [
      [
        '#',
        'chain',
        'holes',
        `Σ holes ${unitSymbol('length', units)}`,
        `Σ s²/4g ${unitSymbol('length', units)}`,
        `wn ${unitSymbol('length', units)}`,
        `An ${unitSymbol('area', units)}`,
      ],
    ];
    d.least.forEach((c, i) =>
      rows.push([
        String(i + 1),
        chainLabel(c.holes),
        String(c.holes.length),
        n(c.deducted, 'length', units),
        n(c.staggerSum, 'length', units),
        n(c.netWidth, 'length', units),
        n(c.netArea, 'area', units),
      ]),
    );
    const lines = columns(rows, ['right', 'left', 'right', 'right', 'right', 'right', 'right']);
    out.push(`    ${lines[0]}`);
    d.least.forEach((c, i) => {
      out.push(`    ${lines[i + 1]}${i === 0 ? '   governs' : ''}`);
      out.push(...legLines(c, units));
    });
  }
  if (report.rejected.length > 0) {
    out.push('');
    out.push(
      '  least chains that cannot form in a direction asked for, and the hole that keeps each from forming:',
    );
    for (const c of report.rejected) {
      out.push(`    ${chainLabel(c.holes)}  wn ${q(c.netWidth, 'length', units)}  ${blocked(c)}`);
      out.push(...legLines(c, units));
    }
  }
  return out.join('\n') + '\n';
}

/** The chains report as JSON (the engine's chain objects, with the file and member). */
export function formatChainsJson(report: ChainsReport): string {
  return (
    JSON.stringify(
      {
        file: report.file,
        member: report.memberId,
        units: report.profile?.units,
        holeWidths: report.holeWidths,
        directions: report.directions,
        rejected: report.rejected,
      },
      null,
      2,
    ) + '\n'
  );
}
