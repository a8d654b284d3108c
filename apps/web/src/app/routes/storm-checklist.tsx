import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useChecklist, useSaveChecklist } from '@/features/storm/api/manage-watch';
import { ChecklistEditor } from '@/features/storm/components/checklist-editor';

function ChecklistScreen() {
  const checklist = useChecklist();
  const save = useSaveChecklist();
  return (
    <Page
      title="Storm checklist"
      intro={<p>The list each member ticks per boat. A new watch copies it when it opens.</p>}
    >
      <p>
        <Link to={paths.storm.href()}>Back to storm watches</Link>
      </p>
      {checklist.isPending && <Spinner label="Loading the checklist…" />}
      {checklist.isError && (
        <Alert tone="error" title="Couldn't load the checklist">
          <p>{errorMessage(checklist.error)}</p>
        </Alert>
      )}
      {checklist.data && (
        <ChecklistEditor
          items={checklist.data.items}
          isPending={save.isPending}
          onSave={(items) => save.mutateAsync({ items })}
        />
      )}
    </Page>
  );
}

/** The club's storm checklist template (moderators and admins). */
export function StormChecklistRoute() {
  return (
    <RequireAuth roles={['moderator', 'admin']}>
      <ChecklistScreen />
    </RequireAuth>
  );
}
