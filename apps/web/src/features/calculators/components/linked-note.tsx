import { Button } from '@/components/ui/button';

/** Says whether a calculator follows the boat and conditions at the top, with a way back when it does not. */
export function LinkedNote({
  own,
  onFollow,
  what = 'boat and conditions',
}: {
  own: boolean;
  onFollow: () => void;
  what?: string;
}) {
  if (!own) return <p className="text-sm text-ink-700">Using the {what} at the top of the page.</p>;
  return (
    <p className="flex flex-wrap items-center gap-2 text-sm text-ink-700">
      <span>Your own values here, not the {what} at the top.</span>
      <Button variant="secondary" size="sm" onClick={onFollow}>
        Use the values at the top again
      </Button>
    </p>
  );
}
