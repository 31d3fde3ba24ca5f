import { CONDITION_GRADES, type ConditionGrade } from '@/lib/scoring';

const GRADE_CLASS: Record<ConditionGrade, string> = {
  Excellent: 'text-band-true border-band-true/50 bg-band-true/10',
  'Very good': 'text-band-true border-band-true/50 bg-band-true/5',
  Good: 'text-band-fair border-band-fair/50 bg-band-fair/10',
  Fair: 'text-band-worn border-band-worn/50 bg-band-worn/10',
  Poor: 'text-band-rebuild border-band-rebuild/50 bg-band-rebuild/10',
  Salvage: 'text-band-rebuild border-band-rebuild/50 bg-band-rebuild/5',
};

/**
 * The overall condition as a word and a six-step gauge (more filled steps = better condition),
 * so it reads without colour, as the PDF's cover shows it; a provisional grade says so in words.
 */
export function ConditionBadge({ grade, provisional = false }: { grade: ConditionGrade; provisional?: boolean }) {
  const filled = CONDITION_GRADES.length - CONDITION_GRADES.indexOf(grade);
  return (
    <span className={`inline-flex items-center gap-2 whitespace-nowrap rounded-full border px-3 py-0.5 text-sm font-medium ${GRADE_CLASS[grade]}`}>
      <svg aria-hidden="true" width="26" height="10" viewBox="0 0 26 10">
        {CONDITION_GRADES.map((g, i) => (
          <rect key={g} x={i * 4.4} y={10 - (i + 1) * 1.6} width="3.4" height={(i + 1) * 1.6} fill="currentColor" opacity={i < filled ? 1 : 0.25} />
        ))}
      </svg>
      {grade}
      {provisional ? <span className="font-normal">, provisional</span> : null}
    </span>
  );
}
