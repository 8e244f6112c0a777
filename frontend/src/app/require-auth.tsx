import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '../config/paths';
import { useAccessToken } from './session';

/** Signed-out visitors go to the sign-in page, which sends them back here afterwards. */
export function RequireAuth() {
  const token = useAccessToken();
  const location = useLocation();
  if (!token) {
    return <Navigate to={paths.login} replace state={{ from: `${location.pathname}${location.search}` }} />;
  }
  return <Outlet />;
}
