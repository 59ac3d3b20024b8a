import type { ReactNode } from 'react';

/**
 * A suggestion a person takes with one tap ("Plan: 34.0 °F"), never a value put in a field for them:
 * a form starts empty, so nothing from an earlier entry or a plan is signed unless someone chose it.
 */
export function SuggestionChip({
  label,
  children,
  onPick,
}: {
  /** What the suggestion is, read before its value ("Plan", "Last reading", "Usual"). */
  label: string;
  children: ReactNode;
  onPick: () => void;
}) {
  return (
    <button
      type="button"
      onClick={onPick}
      className="inline-flex min-h-touch items-center gap-1 rounded-full border-2 border-dashed border-brass-500 bg-brass-100 px-4 text-base hover:bg-white"
    >
      <span className="text-ink-700">{label}:</span>{' '}
      <span className="font-semibold tabular-nums text-ink-900">{children}</span>
    </button>
  );
}
