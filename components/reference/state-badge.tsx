import { type EditionState, STATE_LABEL } from './format';

export interface StateBadgeProps {
  state: EditionState;
}

const STYLE: Record<EditionState, string> = {
  draft: 'border-dashed border-ink-faint text-ink-soft',
  in_review: 'border-brine-500 text-brine-700',
  in_force: 'border-verdigris-500 bg-verdigris-50 text-verdigris-700 font-semibold',
  retired: 'border-rule text-ink-soft',
  discarded: 'border-dashed border-rule text-ink-soft line-through',
};

/** The state as words (never by colour alone). */
export function StateBadge({ state }: StateBadgeProps) {
  return <span className={`inline-block rounded border px-2 py-0.5 text-xs uppercase tracking-wide ${STYLE[state]}`}>{STATE_LABEL[state]}</span>;
}
