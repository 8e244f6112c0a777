import { useNavigate, useParams } from 'react-router-dom';
import { PageTitle } from '../../components/page-title';
import { paths } from '../../config/paths';
import { useSignedIn } from '../../features/auth';
import { InvitationPanel } from '../../features/invitations';
import { useCurrentUser } from '../session';
import { AuthLayout } from './auth-layout';

export default function InvitationPage() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const currentUser = useCurrentUser();
  const signedIn = useSignedIn();
  return (
    <AuthLayout>
      <PageTitle title={'Invitation'} />
      <InvitationPanel
        token={token}
        signedInEmail={currentUser.data?.email ?? null}
        onSignedIn={(response) => {
          signedIn(response);
          navigate(paths.farms, { replace: true });
        }}
        onJoined={(farmId) => navigate(paths.farm(farmId), { replace: true })}
        signInPath={paths.login}
        signInState={{ from: paths.invitation(token) }}
      />
    </AuthLayout>
  );
}
