import type { ComponentProps } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<Variant, string> = {
  primary: 'bg-pine-700 text-white hover:bg-pine-800 disabled:bg-pine-200',
  secondary: 'bg-white text-pine-800 border border-pine-200 hover:bg-pine-50 disabled:text-stone-400',
  danger: 'bg-clay text-white hover:brightness-110 disabled:opacity-50',
  quiet: 'text-pine-700 underline-offset-2 hover:underline disabled:text-stone-400',
};

export function Button({
  variant = 'primary',
  className = '',
  type = 'button',
  ...props
}: ComponentProps<'button'> & { variant?: Variant }) {
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-semibold transition disabled:cursor-not-allowed ${variants[variant]} ${className}`}
      {...props}
    />
  );
}
