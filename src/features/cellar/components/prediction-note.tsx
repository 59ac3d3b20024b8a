import type { FermentationPrediction } from '../../../../shared/brewing';

/** Within a gravity point of the predicted FG counts as there (common practice, no source). */
const THERE_SG = 0.001;

/**
 * What the curve predicts, worded for when it is read: a date ahead while it still is; once that
 * date has passed, either that the batch got there or that it is overdue for the predicted gravity.
 */
export function PredictionNote({
  prediction,
  latestSg,
  nowMs,
  date,
}: {
  prediction: FermentationPrediction;
  latestSg: number | null;
  nowMs: number;
  date: Intl.DateTimeFormat;
}) {
  const fg = prediction.predictedFg.toFixed(3);
  if (prediction.predictedAtMs > nowMs) {
    return (
      <div className="text-lg font-semibold tabular-nums">
        FG ≈ {fg} by {date.format(prediction.predictedAtMs)}
      </div>
    );
  }
  if (latestSg !== null && latestSg <= prediction.predictedFg + THERE_SG) {
    return <div className="text-lg font-semibold tabular-nums">At the predicted FG ≈ {fg}</div>;
  }
  const days = Math.floor((nowMs - prediction.predictedAtMs) / 86_400_000);
  return (
    <div className="tabular-nums">
      <div className="text-lg font-semibold text-ember-700">Overdue for FG ≈ {fg}</div>
      <div className="text-sm text-ink-700">
        Expected by {date.format(prediction.predictedAtMs)}
        {days >= 1 ? `, ${days} day${days === 1 ? '' : 's'} ago` : ''}. Take a reading; if it has not moved, check the
        yeast and temperature.
      </div>
    </div>
  );
}
