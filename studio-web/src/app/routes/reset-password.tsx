import { Button, Link as ThemeLink, Text } from '@radix-ui/themes';
import { Link, useLocation } from 'react-router-dom';
import { AuthPage } from '@/components/layouts/auth-page';
import { paths } from '@/config/paths';
import { ConfirmResetForm } from '@/features/auth/components/confirm-reset-form';
import { RequestResetForm } from '@/features/auth/components/request-reset-form';
import { linkToken } from '@/features/auth/link-token';

/** Without a link token: ask for a reset e-mail. With one (from the e-mail): set the password. */
export function ResetPasswordRoute() {
  const token = linkToken(useLocation().hash);
  const signIn = (
    <Text size="2">
      <ThemeLink asChild>
        <Link to={paths.signIn.getHref()}>Back to sign in</Link>
      </ThemeLink>
    </Text>
  );
  if (token) {
    return (
      <AuthPage title="Choose a new password" lead="The link works once, within one hour.">
        <ConfirmResetForm
          token={token}
          done={
            <Button asChild size="3">
              <Link to={paths.signIn.getHref()}>Sign in</Link>
            </Button>
          }
        />
      </AuthPage>
    );
  }
  return (
    <AuthPage
      title="Reset your password"
      lead="We e-mail a link to choose a new password to the address of your account."
    >
      <RequestResetForm />
      {signIn}
    </AuthPage>
  );
}
