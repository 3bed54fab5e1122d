import { Flex, Link as ThemeLink, Spinner, Text } from '@radix-ui/themes';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { AuthPage } from '@/components/layouts/auth-page';
import { paths } from '@/config/paths';
import { useInvitation } from '@/features/auth/api/lookup-invitation';
import { AcceptInvitationForm } from '@/features/auth/components/accept-invitation-form';
import { linkToken } from '@/features/auth/link-token';
import { HOME_AFTER_SIGN_IN } from '@/features/auth/session-loaders';

/** The page an invitation e-mail links to: see the offer, choose a name and password. */
export function AcceptInvitationRoute() {
  const token = linkToken(useLocation().hash);
  const invitation = useInvitation(token);
  const navigate = useNavigate();
  const signIn = (
    <Text size="2">
      Already have an account?{' '}
      <ThemeLink asChild>
        <Link to={paths.signIn.getHref()}>Sign in</Link>
      </ThemeLink>
    </Text>
  );

  return (
    <AuthPage title="Join Overshoot" lead="An admin invited you. Choose your name and a password.">
      {!token ? (
        <Text color="gray" role="alert">
          This address has no invitation token. Open the link from your invitation e-mail again,
          whole, or ask an admin for a new invitation.
        </Text>
      ) : null}
      {token && invitation.isPending ? (
        <Flex align="center" gap="2">
          <Spinner />
          <Text color="gray">Reading the invitation…</Text>
        </Flex>
      ) : null}
      {invitation.isError ? <ApiErrorCallout error={invitation.error} /> : null}
      {token && invitation.data ? (
        <AcceptInvitationForm
          token={token}
          invitation={invitation.data}
          onAccepted={() => void navigate(HOME_AFTER_SIGN_IN, { replace: true })}
        />
      ) : null}
      {signIn}
    </AuthPage>
  );
}
