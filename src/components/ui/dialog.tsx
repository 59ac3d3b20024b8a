import { useEffect, useRef, type ReactNode } from 'react';

/** A modal dialog on the native <dialog> element (focus trap and Escape come with it). */
export function Dialog({
  open,
  onClose,
  title,
  children,
}: {
  open: boolean;
  onClose: () => void;
  title: string;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal?.();
    if (!open && dialog.open) dialog.close?.();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-label={title}
      className="w-[min(36rem,92vw)] rounded-xl p-0 shadow-xl backdrop:bg-ink-900/50"
    >
      <div className="p-6">
        <h2 className="text-xl font-bold">{title}</h2>
        <div className="mt-4">{children}</div>
      </div>
    </dialog>
  );
}
