import { GRADE_SCALE_TEXT, REPORT_STATEMENTS, type ScoringResult } from '@/lib/scoring';

/**
 * What every report says whatever the machine: the written grade scale, the scope and independence,
 * "not a warranty" and no advice to buy or not to buy; and, for readers of the findings, what was
 * not inspected and why.
 */
export function ReportStatements({ notInspected }: { notInspected: ScoringResult['notInspected'] | null }) {
  return (
    <section aria-labelledby="statements-heading" className="mt-8 grid gap-6 lg:grid-cols-2">
      <div>
        <h2 id="statements-heading" className="text-lg font-semibold">
          How to read the grade
        </h2>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          {GRADE_SCALE_TEXT.map((g) => (
            <div key={g.grade} className="contents">
              <dt className="font-semibold">
                {g.grade} <span className="figures font-normal text-ink-soft">from {g.fromScore}</span>
              </dt>
              <dd className="text-ink-soft">{g.meaning}</dd>
            </div>
          ))}
        </dl>
        {notInspected && notInspected.length > 0 ? (
          <>
            <h2 className="mt-6 text-lg font-semibold">Not inspected, and why</h2>
            <ul className="mt-2 space-y-1">
              {notInspected.map((n) => (
                <li key={n.id}>
                  <span className="font-medium">{n.label}</span> <span className="text-ink-soft">— {n.reason}</span>
                </li>
              ))}
            </ul>
          </>
        ) : null}
      </div>
      <div className="space-y-3 text-ink-soft">
        <h2 className="text-lg font-semibold text-ink">What this report is, and is not</h2>
        <p>{REPORT_STATEMENTS.scope}</p>
        <p>{REPORT_STATEMENTS.independence}</p>
        <p>{REPORT_STATEMENTS.notAWarranty}</p>
        <p>{REPORT_STATEMENTS.noAdvice}</p>
      </div>
    </section>
  );
}
