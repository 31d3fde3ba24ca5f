/**
 * Where a permissible value or formula comes from, in three kinds:
 *  - src: a published standard, handbook or worked example, named;
 *  - memory: recalled from a named document without the text at hand;
 *  - practice: common shop practice with no published source (Waygrade's own rubric included).
 */
export type SourceKind = 'src' | 'memory' | 'practice';

export interface SourceMark {
  kind: SourceKind;
  reference: string;
}

export const src = (reference: string): SourceMark => ({ kind: 'src', reference });
export const memory = (reference: string): SourceMark => ({ kind: 'memory', reference });
export const practice = (reference = 'common practice'): SourceMark => ({ kind: 'practice', reference });

const KIND_WORDS: Readonly<Record<SourceKind, string>> = {
  src: 'source',
  memory: 'from memory',
  practice: 'common practice',
};

export function describeSource(mark: SourceMark): string {
  return mark.kind === 'practice' ? `${mark.reference} (common practice, no published source)` : `${KIND_WORDS[mark.kind]}: ${mark.reference}`;
}
