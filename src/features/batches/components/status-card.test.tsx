// Dumping a batch is the head brewer's alone: the assistant never sees the control.
import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { StatusCard } from './status-card';

const withQuery = (ui: React.ReactNode) => <QueryClientProvider client={new QueryClient()}>{ui}</QueryClientProvider>;

describe('status card', () => {
  it('offers Dump… to the head brewer only; both roles can move the batch on', () => {
    const { unmount } = render(withQuery(<StatusCard batchId={1} status="fermenting" role="head_brewer" />));
    expect(screen.getByRole('button', { name: 'Dump…' })).toBeTruthy();
    unmount();
    render(withQuery(<StatusCard batchId={1} status="fermenting" role="assistant_brewer" />));
    expect(screen.queryByRole('button', { name: 'Dump…' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Move to conditioning' })).toBeTruthy();
  });
});
