import { Suspense } from 'react';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useTopics } from '@/features/knowledge/api/get-topics';
import { errorMessage } from '@/lib/form-errors';
import { lazyNamed } from '@/lib/lazy-named';
import { AdminSections } from '../layout/admin-sections';

// The topic forms load while the topics are fetched, not with the page.
const TopicEditor = lazyNamed(
  () => import('@/features/knowledge/components/topic-editor'),
  'TopicEditor',
);

function TopicsScreen() {
  const topics = useTopics();
  if (topics.isPending) return <Spinner label="Loading the topics…" />;
  if (topics.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(topics.error)}</p>
      </Alert>
    );
  return (
    <Suspense fallback={<Spinner label="Loading the topics…" />}>
      <TopicEditor topics={topics.data} />
    </Suspense>
  );
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
