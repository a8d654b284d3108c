import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useTopics } from '@/features/knowledge/api/get-topics';
import { TopicEditor } from '@/features/knowledge/components/topic-editor';
import { errorMessage } from '@/lib/form-errors';
import { AdminSections } from '../layout/admin-sections';

function TopicsScreen() {
  const topics = useTopics();
  if (topics.isPending) return <Spinner label="Loading the topics…" />;
  if (topics.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(topics.error)}</p>
      </Alert>
    );
  return <TopicEditor topics={topics.data} />;
}

/** Admins edit the topics knowledge posts are filed under. */
export function AdminTopicsRoute() {
  return (
    <RequireAuth roles={['admin']}>
      <Page
        title="Topics"
        intro={<p>Add, rename, reorder and retire the topics members file their posts under.</p>}
      >
        <AdminSections />
        <TopicsScreen />
      </Page>
    </RequireAuth>
  );
}
