import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Button } from './button';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

/**
 * A button for a change that is hard to take back: the first press asks, in words, what will happen, and only
 * "Yes, …" does it. "Cancel" (or Esc on either button) steps back.
 */
export function ConfirmButton({
  children,
  question,
  confirmLabel,
  onConfirm,
  disabled,
  variant = 'primary',
  className = '',
}: {
  children: ReactNode;
  question: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  disabled?: boolean;
  variant?: Variant;
  className?: string;
}) {
  const [asking, setAsking] = useState(false);
  const questionId = useId();
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (asking) confirmRef.current?.focus();
  }, [asking]);
  if (!asking)
    return (
      <Button variant={variant} disabled={disabled} className={className} onClick={() => setAsking(true)}>
        {children}
      </Button>
    );
  return (
    <div
      role="group"
      aria-labelledby={questionId}
      className="flex flex-wrap items-center gap-2 rounded-md border border-tape bg-amber-50 px-3 py-2"
    >
      <p id={questionId} className="text-sm text-amber-950">
        {question}
      </p>
      <Button
        ref={confirmRef}
        className={className}
        variant={variant === 'danger' ? 'danger' : 'primary'}
        disabled={disabled}
        onKeyDown={(e) => {
          if (e.key === 'Escape') setAsking(false);
        }}
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </Button>
      <Button
        variant="secondary"
        onKeyDown={(e) => {
          if (e.key === 'Escape') setAsking(false);
        }}
        onClick={() => setAsking(false)}
      >
        Cancel
      </Button>
    </div>
  );
}
