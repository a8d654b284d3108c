import { Spinner } from '@/components/ui/spinner';

/** Shown while the first screen's code loads. */
export function PageFallback() {
  return (
    <div className="flex min-h-dvh items-center justify-center">
      <Spinner label="Loading Rodewise…" />
    </div>
  );
}
