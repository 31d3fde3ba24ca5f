import { fmt } from './format-number';
import { formatMoney } from './money';
import type { ScoringResult } from './result';

/** Units of measured quantities; other checks (ratings, device states) read better as words. */
const PHYSICAL_UNITS = new Set(['mm', 'mm/m', 'mm/s', 'K', 's', 'Ω', 'MΩ', 'mm²/s']);

/** Plain-text summary of a graded report, for the CLI and for e-mail bodies. */
export function formatReportText(r: ScoringResult): string {
  const m = r.machine;
  const lines: string[] = [];
  const title = [m.maker, m.model].filter(Boolean).join(' ') || 'Centre lathe';
  lines.push(`WAYGRADE CONDITION REPORT — ${title}${m.serialNumber ? ` (serial ${m.serialNumber})` : ''}`);
  lines.push(
    `Centre lathe, ${m.sizeClass}; swing ${fmt(m.swingOverBedMm, 1)} mm, ${fmt(m.distanceBetweenCentresMm, 0)} mm between centres` +
      `${m.year ? `, built ${m.year}` : ''}${m.inspectedOn ? `; inspected ${m.inspectedOn}` : ''}`,
  );
  lines.push(`Scoring ${r.scoringVersion}, survey format v${r.surveyFormatVersion}`);
  lines.push('');
  lines.push(`OVERALL CONDITION: ${r.overall.condition ?? 'not graded'}${r.overall.score === null ? '' : ` (score ${fmt(r.overall.score, 1)}/100)`}`);
  lines.push(`  ${r.overall.explanation}`);
  lines.push(`CONFIDENCE: ${fmt(r.confidence.value * 100, 0)} % — ${r.confidence.explanation}`);
  lines.push('');
  // Deal-breakers come first, whatever the grade (old results stored before 1.1 have none).
  if (r.dealBreakers?.length) {
    lines.push('DEAL-BREAKERS:');
    for (const d of r.dealBreakers) lines.push(`  ! ${d.label}: ${d.evidence}`);
    lines.push('');
  }
  if (r.safetyFindings.length) {
    lines.push('SAFETY — FIX BEFORE USE:');
    for (const f of r.safetyFindings) lines.push(`  ! ${f.message}`);
    lines.push('');
  }
  lines.push('SUBSYSTEMS:');
  for (const s of r.subsystems) {
    lines.push(`  ${s.label.padEnd(24)} ${(s.grade ?? 'not assessed').padEnd(12)} ${s.score === null ? '' : fmt(s.score, 1).padStart(5)}  (${s.measuredChecks}/${s.totalChecks} checks)`);
  }
  lines.push('');
  lines.push('CHECKS (q = measured / permissible):');
  for (const c of r.checks.filter((c) => c.status === 'measured')) {
    const physical = c.measured !== null && PHYSICAL_UNITS.has(c.measured.unit);
    const measured = !c.measured
      ? ''
      : physical
        ? `${fmt(c.measured.value, 4)} ${c.measured.unit}${c.measured.text ? ` [${c.measured.text}]` : ''}`
        : (c.measured.text ?? `${fmt(c.measured.value, 4)} ${c.measured.unit}`);
    const permitted = !c.permissible ? '' : physical ? `${fmt(c.permissible.value, 4)} ${c.permissible.unit}` : c.permissible.basis;
    lines.push(`  ${c.bandLabel.padEnd(11)} q=${fmt(c.q ?? 0, 2).padEnd(6)} ${c.label}: ${measured} vs ${permitted}`);
  }
  const missing = r.checks.filter((c) => c.status === 'not-measured');
  if (missing.length) lines.push(`  Not measured (${missing.length}): ${missing.map((c) => c.label).join(', ')}`);
  lines.push('');
  lines.push(`REPAIR ESTIMATE: ${formatMoney(r.repairEstimate.total)}`);
  for (const l of r.repairEstimate.lines) lines.push(`  ${formatMoney(l.cost).padStart(14)}  ${l.label} (${l.triggeredBy.join(', ')})`);
  lines.push('');
  const v = r.valuation;
  lines.push('VALUATION:');
  lines.push(`  Premise: ${v.premise.label}; effective date ${v.effectiveDate ?? 'not stated'}; currency ${v.currency}`);
  if (v.range) lines.push(`  Range: ${v.range.explanation}`);
  if (v.costApproach) {
    lines.push('  Cost approach:');
    for (const w of v.costApproach.working) lines.push(`    ${w}`);
  }
  if (v.salesComparison) {
    lines.push('  Sales comparison:');
    for (const w of v.salesComparison.working) lines.push(`    ${w}`);
  }
  if (v.reconciliation) {
    lines.push('  Reconciliation:');
    for (const w of v.reconciliation.working) lines.push(`    ${w}`);
  }
  for (const n of v.notes) lines.push(`  Note: ${n}`);
  lines.push('');
  for (const n of r.notices) lines.push(n);
  return lines.join('\n');
}
