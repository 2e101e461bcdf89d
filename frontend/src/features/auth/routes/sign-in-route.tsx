import { Navigate, useNavigate, useSearchParams } from 'react-router';
import { Box, Paper, Stack, Typography } from '@mui/material';
import { LogoMark } from '../../../components/brand/logo-mark.js';
import { useSession } from '../../../lib/session.js';
import { useSignIn } from '../api/sign-in.js';
import { SignInForm } from '../components/sign-in-form.js';

/** Only same-site paths are followed after sign-in, so a crafted link cannot send people elsewhere. */
export function safeNext(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-in')) return '/';
  return next;
}

export default function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const session = useSession();
  const signIn = useSignIn();
  const next = safeNext(params.get('next'));
  if (session) return <Navigate to={next} replace />;
  return (
    <Box sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', bgcolor: 'background.default', p: 2 }}>
      <Paper variant="outlined" sx={{ p: 4, width: '100%', maxWidth: 400 }}>
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', mb: 1 }}>
          <LogoMark size={40} />
          <Typography variant="h1" component="h1">
            Linkloom
          </Typography>
        </Stack>
        <Typography variant="body2" color="text.secondary" sx={{ mb: 3 }}>
          Sign in to see how your documentation hangs together.
        </Typography>
        <SignInForm
          busy={signIn.isPending}
          onSubmit={async (input) => {
            await signIn.mutateAsync(input);
            navigate(next, { replace: true });
          }}
        />
      </Paper>
    </Box>
  );
}
