import { generatePath, Navigate, useLocation, useParams } from 'react-router-dom';

/** An address from before a rename: sends the visitor on to its new form, keeping ids and the query string. */
export function OldPathRedirect({ to }: { to: string }) {
  const params = useParams();
  const { search, hash } = useLocation();
  return <Navigate replace to={`${generatePath(to, params)}${search}${hash}`} />;
}
