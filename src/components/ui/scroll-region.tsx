import { useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * A wide table that slides sideways inside the page (the page itself never does). When it is wider than the
 * screen it says so above the table, and it takes keyboard focus so the arrow keys can move it.
 */
export function ScrollRegion({
  label,
  children,
  className = '',
}: {
  label: string;
  children: ReactNode;
  className?: string;
}) {
  const ref = useRef<HTMLDivElement>(null);
  const [wider, setWider] = useState(false);
  useEffect(() => {
    const box = ref.current;
    if (!box) return;
    const measure = () => setWider(box.scrollWidth > box.clientWidth + 1);
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(box);
    if (box.firstElementChild) observer.observe(box.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div>
      {wider && (
        <p className="no-print mb-1 text-sm font-semibold text-stone-700" aria-hidden="true">
          ← Slide the table sideways to see every column →
        </p>
      )}
      <div
        ref={ref}
        role="region"
        aria-label={label}
        // Focusable so a keyboard can scroll it (WCAG 2.1.1), only when there is something to scroll.
        // eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex -- a scrolling region must take focus
        tabIndex={wider ? 0 : undefined}
        className={`overflow-x-auto print:overflow-visible ${className}`}
      >
        {children}
      </div>
    </div>
  );
}
