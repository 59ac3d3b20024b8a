import { useEffect, useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { Addition } from '../../../../shared/batches/brew-day';
import { Card } from '../../../components/ui';
import { showTime } from '../../../lib/time';
import { AdditionList } from './step-details';

const clock = (seconds: number) => {
  const s = Math.max(0, Math.round(seconds));
  return `${String(Math.floor(s / 60)).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
};

/**
 * Counts down to the next boil addition not yet logged and shows what goes in. Computed from the logged boil
 * start (on the server or still waiting on this device), so it keeps counting across a reload; it stops at
 * the logged flame-out (or the first later step), so the boil's length stays on screen.
 */
export function BoilTimer({
  boilStartedAt,
  boilEndedAt = null,
  boilMinutes,
  additions,
  loggedMinutes = new Set<number>(),
  system,
  timeZone,
}: {
  boilStartedAt: string | null;
  /** When flame-out (or any later step) was logged. */
  boilEndedAt?: string | null;
  boilMinutes: number;
  additions: { minute: number; additions: Addition[] }[];
  /** Minutes (remaining) whose boil addition step has been logged. */
  loggedMinutes?: ReadonlySet<number>;
  system: UnitSystem;
  timeZone: string;
}) {
  const [now, setNow] = useState(() => Date.now());
  const running = Boolean(boilStartedAt) && !boilEndedAt;
  useEffect(() => {
    if (!running) return;
    setNow(Date.now());
    const id = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(id);
  }, [running]);

  if (!boilStartedAt) {
    return (
      <Card className="p-4">
        <h2 className="text-lg font-bold">Boil timer</h2>
        <p className="mt-1 text-ink-500">Starts when “Start the boil” is marked done.</p>
      </Card>
    );
  }
  const started = Date.parse(boilStartedAt);
  if (boilEndedAt) {
    return (
      <section className="rounded-xl bg-cellar-100 p-4 text-ink-900 shadow-sm" aria-label="Boil timer">
        <h2 className="text-lg font-bold">Boil timer</h2>
        <p className="mt-1 text-lg" data-testid="boil-ended">
          Boil ended {showTime(boilEndedAt, timeZone)} after{' '}
          <span className="font-semibold tabular-nums">{clock((Date.parse(boilEndedAt) - started) / 1000)}</span>
        </p>
      </section>
    );
  }
  const elapsed = Math.max(0, (now - started) / 1000);
  const left = boilMinutes * 60 - elapsed;
  // The next addition is the first (latest minute first) not yet logged: its time may already have come
  // (a 60 min hop in a 60 min boil is due at the start), and it stays on screen until it is logged.
  const next = additions.find((a) => !loggedMinutes.has(a.minute));
  const dueIn = next ? (boilMinutes - next.minute) * 60 - elapsed : 0;
  return (
    <section className="rounded-xl bg-cellar-800 p-4 text-white shadow-sm" aria-live="polite" aria-label="Boil timer">
      <h2 className="text-lg font-bold">Boil timer</h2>
      <p className="mt-1 text-cellar-100">
        {left > 0 ? (
          <>
            Boil left <span className="font-semibold tabular-nums text-white">{clock(left)}</span>
          </>
        ) : (
          <span className="text-2xl font-bold text-white">Boil time is up: flame out.</span>
        )}
      </p>
      {next ? (
        <>
          {dueIn > 0 ? (
            <>
              <p className="mt-3 text-cellar-100">Next addition at {next.minute} min, in</p>
              <p className="text-6xl font-bold tabular-nums" data-testid="boil-countdown">
                {clock(dueIn)}
              </p>
            </>
          ) : (
            <p className="mt-3 text-3xl font-bold" data-testid="boil-add-now">
              Add now: {next.minute} min addition
              {dueIn < -60 && (
                <span className="block text-lg font-semibold text-brass-400">due {clock(-dueIn)} ago</span>
              )}
            </p>
          )}
          <AdditionList additions={next.additions} system={system} className="mt-2 text-lg" />
        </>
      ) : (
        <p className="mt-3 text-lg">Every boil addition is logged.</p>
      )}
    </section>
  );
}
