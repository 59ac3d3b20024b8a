// Dumping a batch needs 'batch.dump': the control is there for a role the policy lets dump and absent for one it
// does not. The role comes from the real current-person query over a stubbed network, as the app loads it.
import { Suspense } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '../../../lib/query-client';
import type { Me } from '../../../../shared/schemas/auth';
import type { Role } from '../../../../shared/schemas/roles';
import { StatusCard } from './status-card';

/** The API as the card meets it: only /api/auth/me answers, with a person of the given role. */
function signedInAs(role: Role) {
  const me: Me = {
    id: 7,
    email: 'someone@example.test',
    displayName: 'Someone',
    role,
    brewery: { id: 1, name: 'Test Brewing', unitSystem: 'us', timeZone: 'America/Chicago' },
  };
  const fetch = vi.fn(async (url: string) =>
    url === '/api/auth/me'
      ? new Response(JSON.stringify(me), { status: 200, headers: { 'content-type': 'application/json' } })
      : new Response(JSON.stringify({ error: { code: 'not_found', message: 'Not here' } }), { status: 404 }),
  );
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

const renderCard = () =>
  render(
    <QueryClientProvider client={createQueryClient()}>
      <Suspense fallback={<p>Loading</p>}>
        <StatusCard batchId={1} status="fermenting" />
      </Suspense>
    </QueryClientProvider>,
  );

describe('status card', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('offers Dump… to the head brewer, whom the policy lets dump a batch', async () => {
    const fetch = signedInAs('head_brewer');
    renderCard();
    expect(await screen.findByRole('button', { name: 'Dump…' })).toBeTruthy();
    expect(fetch).toHaveBeenCalledWith('/api/auth/me', expect.anything());
  });

  it('hides Dump… from the assistant brewer, who may still move the batch on', async () => {
    signedInAs('assistant_brewer');
    renderCard();
    expect(await screen.findByRole('button', { name: 'Move to conditioning' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Dump…' })).toBeNull();
  });
});
