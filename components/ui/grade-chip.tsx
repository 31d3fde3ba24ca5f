import { CONDITION_GRADES, type ConditionGrade } from '@/lib/scoring/grading/condition-scale';

// Text colours on white/paper that pass 4.5:1; the gauge and the word carry the meaning without colour.
const GRADE_TEXT: Record<ConditionGrade, string> = {
  Excellent: 'text-band-true',
  'Very good': 'text-band-true',
  Good: 'text-band-fair',
  Fair: 'text-band-worn',
  Poor: 'text-band-rebuild',
  Salvage: 'text-band-rebuild',
};

/** Six steps, more filled = better condition: the shape that goes with every grade word. */
export function GradeGauge({ grade, className = '' }: { grade: ConditionGrade; className?: string }) {
  const filled = CONDITION_GRADES.length - CONDITION_GRADES.indexOf(grade);
  return (
    <svg aria-hidden="true" width="22" height="10" viewBox="0 0 26 10" className={className}>
      {CONDITION_GRADES.map((g, i) => (
        <rect key={g} x={i * 4.4} y={10 - (i + 1) * 1.6} width="3.4" height={(i + 1) * 1.6} fill="currentColor" opacity={i < filled ? 1 : 0.22} />
      ))}
    </svg>
  );
}

/**
 * A compact grade for dense tables: the gauge and the word, optionally the score. `null` means the
 * subsystem had no measured check. A provisional grade (too little measured to be firm) says so in words.
 */
export function GradeChip({ grade, score, provisional = false }: { grade: ConditionGrade | null; score?: number | null; provisional?: boolean }) {
  if (!grade) {
    return (
      <span className="inline-flex items-center gap-1 whitespace-nowrap text-sm text-ink-faint" title="No measured check in this subsystem">
        <span aria-hidden="true">–</span> Not measured
      </span>
    );
  }
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap text-sm font-medium ${GRADE_TEXT[grade]}`}
      title={`${grade}${score === undefined || score === null ? '' : `, score ${score} of 100`}${provisional ? ', provisional: too little of the machine was measured for a firm grade' : ''}`}
    >
      <GradeGauge grade={grade} />
      {grade}
      {provisional ? <span className="font-normal text-ink-soft">, provisional</span> : null}
    </span>
  );
}
