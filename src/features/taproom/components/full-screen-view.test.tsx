// The bar screen's full-screen view: what is behind it is inert while it is open, and Escape leaves it.
import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { FullScreenView } from './full-screen-view';

describe('FullScreenView', () => {
  it('makes the page behind it inert while open, and wakes it again on close', () => {
    const { container, unmount } = render(
      <FullScreenView label="On tap" onLeave={() => undefined}>
        <button>Close</button>
      </FullScreenView>,
    );
    const board = screen.getByRole('region', { name: 'On tap' });
    expect(container.hasAttribute('inert')).toBe(true);
    expect(board.closest('[inert]')).toBeNull();
    expect(container.contains(board)).toBe(false);
    unmount();
    expect(container.hasAttribute('inert')).toBe(false);
    expect(document.body.contains(board)).toBe(false);
  });

  it('leaves something already inert as it was', () => {
    const asleep = document.body.appendChild(document.createElement('div'));
    asleep.setAttribute('inert', '');
    const { unmount } = render(
      <FullScreenView label="On tap" onLeave={() => undefined}>
        board
      </FullScreenView>,
    );
    unmount();
    expect(asleep.hasAttribute('inert')).toBe(true);
    asleep.remove();
  });

  it('calls onLeave on Escape, and not on other keys', () => {
    const onLeave = vi.fn();
    render(
      <FullScreenView label="On tap" onLeave={onLeave}>
        board
      </FullScreenView>,
    );
    fireEvent.keyDown(document, { key: 'Enter' });
    expect(onLeave).not.toHaveBeenCalled();
    fireEvent.keyDown(document, { key: 'Escape' });
    expect(onLeave).toHaveBeenCalledTimes(1);
  });
});
