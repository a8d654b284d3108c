import { Link, type LinkProps } from 'react-router-dom';
import { cn } from '@/lib/cn';

/** `outline`: a border only, on whatever background the link sits on. */
export type LinkButtonVariant = 'primary' | 'secondary' | 'outline';

export interface LinkButtonProps extends LinkProps {
  variant?: LinkButtonVariant;
}

const VARIANT_CLASSES: Record<LinkButtonVariant, string> = {
  primary: 'bg-signal-600 text-white hover:bg-signal-700 hover:text-white',
  secondary: 'border border-sand-500 bg-sand-50 text-ink-900 hover:bg-sand-200',
  outline: 'border border-sand-500',
};

/** A link to another screen that looks like a button (it still navigates like a link). */
export function LinkButton({ variant = 'primary', className, ...rest }: LinkButtonProps) {
  return (
    <Link
      className={cn(
        'inline-flex min-h-11 items-center rounded-md px-4 font-bold no-underline',
        VARIANT_CLASSES[variant],
        className,
      )}
      {...rest}
    />
  );
}
