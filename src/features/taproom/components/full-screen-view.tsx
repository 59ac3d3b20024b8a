import { useEffect, useEffectEvent, useLayoutEffect, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import { cx } from '../../../components/ui';

/**
 * A page that takes the whole screen, such as the bar screen. It is drawn at the end of <body>, over the app,
 * and everything else on the page is made inert while it is open: Tab, a screen reader and a stray tap stay
 * inside it instead of reaching the menu hidden underneath (Sign out among it). Escape calls `onLeave`.
 */
export function FullScreenView({
  label,
  onLeave,
  className,
  children,
}: {
  label: string;
  onLeave: () => void;
  className?: string;
  children: ReactNode;
}) {
  const [host] = useState(() => document.createElement('div'));

  useLayoutEffect(() => {
    document.body.append(host);
    // Only what is not inert already, so closing never wakes something another part of the app put to sleep.
    const behind = [...document.body.children].filter((el) => el !== host && !el.hasAttribute('inert'));
    for (const el of behind) el.setAttribute('inert', '');
    return () => {
      for (const el of behind) el.removeAttribute('inert');
      host.remove();
    };
  }, [host]);

  const leave = useEffectEvent(onLeave);
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key !== 'Escape' || event.defaultPrevented) return;
      event.preventDefault();
      leave();
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, []);

  return createPortal(
    <div
      role="region"
      aria-label={label}
      className={cx('fixed inset-0 z-50 overflow-auto overscroll-contain', className)}
    >
      {children}
    </div>,
    host,
  );
}
