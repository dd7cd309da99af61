import type { ReactNode } from 'react';

/**
 * What stands in for a photo the browser could not draw: most browsers other than Safari cannot draw HEIC. The
 * photo is still stored; `children` is how to open it, where the place allows a link.
 */
export function UnshowablePhoto({
  contentType,
  className,
  children,
}: {
  contentType: string;
  className: string;
  children?: ReactNode;
}) {
  return (
    <span
      className={`flex flex-col items-center justify-center gap-2 bg-stone-100 p-3 text-center text-sm text-stone-700 ${className}`}
    >
      <span>
        {contentType === 'image/heic' ? 'This browser cannot show HEIC photos.' : 'This photo cannot be shown here.'}
      </span>
      {children}
    </span>
  );
}
