import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useReportListing } from '../api/report-listing';

/** Tells the moderators about a listing that looks wrong. */
export function ReportListingForm({ listingId }: { listingId: number }) {
  const report = useReportListing();
  const [reason, setReason] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    report.mutate({ id: listingId, reason });
  };
  if (report.isSuccess)
    return <Alert tone="success">Thanks, the moderators will look at it.</Alert>;
  const fieldError = report.error instanceof ApiError ? report.error.fields.reason : undefined;
  return (
    <details className="text-sm">
      <summary className="cursor-pointer font-bold">Report this listing</summary>
      <form onSubmit={submit} className="mt-2 flex flex-col gap-2">
        <TextField
          label="What is wrong?"
          value={reason}
          onChange={(e) => setReason(e.currentTarget.value)}
          error={fieldError}
        />
        <div>
          <Button type="submit" variant="secondary" size="sm" isPending={report.isPending}>
            Send report
          </Button>
        </div>
        {report.isError && !fieldError && <Alert tone="error">{errorMessage(report.error)}</Alert>}
      </form>
    </details>
  );
}
