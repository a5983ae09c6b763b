import { type ReactNode, useEffect, useId, useRef } from 'react';

/**
 * A modal built on the native <dialog>: the browser traps focus, closes on Escape and
 * returns focus to the control that opened it.
 */
export function Dialog({
  open,
  onClose,
  title,
  description,
  children,
  size = 'md',
}: {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** 'lg' for dialogs that hold a table (e.g. the revision impact before an approval). */
  size?: 'md' | 'lg';
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onClose={onClose}
      className={`m-auto ${size === 'lg' ? 'w-[min(60rem,calc(100vw-2rem))]' : 'w-[min(32rem,calc(100vw-2rem))]'} rounded border border-rule-strong bg-paper-raised p-0 text-ink`}
    >
      {open && (
        <div className="p-6">
          <h2 id={titleId} className="text-lg font-semibold">
            {title}
          </h2>
          {description && (
            <div id={descriptionId} className="mt-1 text-sm text-ink-muted">
              {description}
            </div>
          )}
          <div className="mt-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
