import { useEffect, useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { Addition } from '../../../../shared/batches/brew-day';
import { Card } from '../../../components/ui';
import { showAddition } from './format';

const clock = (seconds: number) => {
  const s = Math.max(0, Math.round(seconds));
  return `${String(Math.floor(s / 60)).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
};

/**
 * Counts down to the next boil addition and shows what goes in. Computed from the logged boil start
 * (on the server or still waiting on this device), so it keeps counting across a reload.
 */
export function BoilTimer({
  boilStartedAt,
  boilMinutes,
  additions,
  system,
}: {
  boilStartedAt: string | null;
  boilMinutes: number;
  additions: { minute: number; additions: Addition[] }[];
  system: UnitSystem;
}) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!boilStartedAt) return;
    const id = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(id);
  }, [boilStartedAt]);

  if (!boilStartedAt) {
    return (
      <Card className="p-4">
        <h2 className="text-lg font-bold">Boil timer</h2>
        <p className="mt-1 text-ink-500">Starts when “Start the boil” is marked done.</p>
      </Card>
    );
  }
  const elapsed = Math.max(0, (now - Date.parse(boilStartedAt)) / 1000);
  const left = boilMinutes * 60 - elapsed;
  // An addition stays on screen until its minute has passed (a 60 min hop in a 60 min boil shows at the start).
  const next = additions.find((a) => (boilMinutes - a.minute) * 60 >= elapsed);
  return (
    <section className="rounded-xl bg-cellar-800 p-4 text-white shadow-sm" aria-live="polite" aria-label="Boil timer">
      <h2 className="text-lg font-bold">Boil timer</h2>
      {left > 0 ? (
        <>
          <p className="mt-1 text-cellar-100">
            Boil left <span className="font-semibold tabular-nums text-white">{clock(left)}</span>
          </p>
          {next ? (
            <>
              <p className="mt-3 text-cellar-100">Next addition at {next.minute} min, in</p>
              <p className="text-6xl font-bold tabular-nums" data-testid="boil-countdown">
                {clock((boilMinutes - next.minute) * 60 - elapsed)}
              </p>
              <ul className="mt-2 space-y-1 text-lg">
                {next.additions.map((a, i) => (
                  <li key={i}>
                    <span className="font-semibold">{showAddition(system, a)}</span> {a.what}
                  </li>
                ))}
              </ul>
            </>
          ) : (
            <p className="mt-3 text-lg">No more additions in the boil.</p>
          )}
        </>
      ) : (
        <p className="mt-2 text-2xl font-bold">Boil time is up: flame out.</p>
      )}
    </section>
  );
}
