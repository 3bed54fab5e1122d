import { Link as ThemeLink, Text } from '@radix-ui/themes';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthPage } from '@/components/layouts/auth-page';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { HOME_AFTER_SIGN_IN } from '@/features/auth/session-loaders';
import { safeRedirect } from '@/lib/safe-redirect';

/** Sign in with e-mail and password, then go back to the page that asked for it. */
export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = params.get('redirectTo');
  return (
    <AuthPage
      title="Sign in"
      lead={
        redirectTo
          ? 'Sign in to continue where you were.'
          : 'Use the e-mail address your invitation came to.'
      }
    >
      <SignInForm
        onSignedIn={() =>
          void navigate(safeRedirect(redirectTo, HOME_AFTER_SIGN_IN), { replace: true })
        }
      />
      <Text size="2">
        <ThemeLink asChild>
          <Link to={paths.resetPassword.getHref()}>Forgot your password?</Link>
        </ThemeLink>
      </Text>
    </AuthPage>
  );
}
