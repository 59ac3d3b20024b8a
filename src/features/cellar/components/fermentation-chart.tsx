import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { dRestTriggerSg, type FermentationPrediction } from '../../../../shared/brewing';
import {
  CELLAR_ACTION_LABELS,
  type ActionView,
  type CellarPlanView,
  type ReadingView,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { niceAxis } from '../../../lib/chart-ticks';

interface Props {
  readings: ReadingView[];
  actions: ActionView[];
  plan: CellarPlanView;
  prediction: FermentationPrediction | null;
  unitSystem: UnitSystem;
  timeZone: string;
}

const GRAVITY = '#12312b';
const TEMPERATURE = '#1f5f99';
const PREDICTION = '#b8860f';

/** Gravity and temperature against time, with the planned FG, the D-rest trigger and logged actions marked. */
export function FermentationChart({ readings, actions, plan, prediction, unitSystem, timeZone }: Props) {
  const temp = displayUnit('temperature', unitSystem);
  const trigger = dRestTriggerSg(plan.plannedFg, plan.dRestPoints);
  const points = readings.map((r) => ({
    t: Date.parse(r.takenAt),
    sg: r.sg,
    temp: r.tempC === null ? null : Number(temp.fromSi(r.tempC).toFixed(1)),
  }));
  const first = points[0]?.t ?? Date.now();
  const last = points[points.length - 1]?.t ?? first;
  const end = prediction ? Math.max(last, Math.min(prediction.predictedAtMs, last + 21 * 86_400_000)) : last;
  const predicted = prediction
    ? Array.from({ length: 25 }, (_, i) => {
        const t = last + ((end - last) * i) / 24;
        return { t, predicted: Number(prediction.at(t).toFixed(4)) };
      })
    : [];
  const gravityAxis = niceAxis(
    [...points.map((p) => p.sg), ...predicted.map((p) => p.predicted), plan.plannedFg, trigger],
    { pad: 0.002 },
  );
  const tempAxis = niceAxis(
    points.map((p) => p.temp),
    { pad: 2, target: 4 },
  );
  const dayFormat = new Intl.DateTimeFormat(undefined, { timeZone, month: 'short', day: 'numeric' });
  const timeFormat = new Intl.DateTimeFormat(undefined, {
    timeZone,
    month: 'short',
    day: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
  });

  return (
    <figure aria-label="Fermentation chart" className="w-full">
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart margin={{ top: 20, right: 16, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#d5e0d9" strokeDasharray="3 3" />
            <XAxis
              dataKey="t"
              type="number"
              scale="time"
              domain={[first - 3_600_000, end + 3_600_000]}
              tickFormatter={(t: number) => dayFormat.format(t)}
              allowDuplicatedCategory={false}
              // Room at the ends so the first date does not run into the lowest gravity label.
              padding={{ left: 28, right: 16 }}
              tickMargin={6}
              minTickGap={24}
            />
            <YAxis
              yAxisId="sg"
              type="number"
              domain={gravityAxis.domain}
              ticks={gravityAxis.ticks}
              interval={0}
              tickFormatter={(v: number) => v.toFixed(3)}
              width={56}
            />
            <YAxis
              yAxisId="temp"
              type="number"
              orientation="right"
              domain={tempAxis.domain}
              ticks={tempAxis.ticks}
              interval={0}
              tickFormatter={(v: number) => `${v.toFixed(tempAxis.decimals)}°`}
              width={40}
            />
            <Tooltip
              labelFormatter={(t) => timeFormat.format(Number(t))}
              formatter={(value, name) =>
                name === 'Temperature' ? [`${String(value)} ${temp.unit}`, name] : [Number(value).toFixed(3), name]
              }
            />
            <ReferenceLine
              yAxisId="sg"
              y={plan.plannedFg}
              stroke={GRAVITY}
              strokeDasharray="6 4"
              label={{
                value: `Planned FG ${plan.plannedFg.toFixed(3)}`,
                position: 'insideTopLeft',
                fill: GRAVITY,
                fontSize: 12,
                fontWeight: 600,
              }}
            />
            <ReferenceLine
              yAxisId="sg"
              y={trigger}
              stroke="#c22a2a"
              strokeDasharray="2 3"
              label={{
                value: `D-rest at ${trigger.toFixed(3)}`,
                position: 'insideBottomRight',
                fill: '#9b1c1c',
                fontSize: 12,
                fontWeight: 600,
              }}
            />
            {actions.map((a) => (
              <ReferenceLine
                key={a.logEntryId}
                yAxisId="sg"
                x={Date.parse(a.at)}
                stroke="#55655f"
                label={{
                  value: CELLAR_ACTION_LABELS[a.action],
                  angle: -90,
                  position: 'insideTopRight',
                  fill: '#2d3a36',
                  fontSize: 11,
                }}
              />
            ))}
            <Line
              yAxisId="temp"
              data={points}
              dataKey="temp"
              name="Temperature"
              stroke={TEMPERATURE}
              strokeWidth={2}
              dot={false}
              isAnimationActive={false}
              connectNulls
            />
            {predicted.length > 0 && (
              <Line
                yAxisId="sg"
                data={predicted}
                dataKey="predicted"
                name="Prediction"
                stroke={PREDICTION}
                strokeWidth={2}
                strokeDasharray="5 5"
                dot={false}
                isAnimationActive={false}
              />
            )}
            <Line
              yAxisId="sg"
              data={points}
              dataKey="sg"
              name="Gravity"
              stroke={GRAVITY}
              strokeWidth={3}
              isAnimationActive={false}
              dot={({ cx, cy, index }: { cx?: number; cy?: number; index?: number }) => (
                <circle
                  key={index}
                  data-testid="gravity-point"
                  cx={cx}
                  cy={cy}
                  r={5}
                  fill="#fff"
                  stroke={GRAVITY}
                  strokeWidth={2}
                />
              )}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 flex flex-wrap gap-4 text-sm text-ink-700">
        <span>
          <span className="mr-1 inline-block h-1 w-6 bg-cellar-800 align-middle" />
          Gravity
        </span>
        <span>
          <span className="mr-1 inline-block h-1 w-6 bg-sky-700 align-middle" />
          Temperature ({temp.unit})
        </span>
        {prediction && (
          <span>
            <span className="mr-1 inline-block h-1 w-6 border-t-2 border-dashed border-brass-600 align-middle" />
            Prediction from the curve so far
          </span>
        )}
      </figcaption>
    </figure>
  );
}
