import { Suspense } from 'react';
import { Link as RouterLink, Outlet, useParams } from 'react-router';
import { Alert, Box, Divider, Drawer, LinearProgress, Toolbar, Typography } from '@mui/material';
import { LogoMark } from '../../components/brand/logo-mark.js';
import { adminNav, docSetNav, globalNav } from '../../config/navigation.js';
import { useSession } from '../../lib/session.js';
import { useDocSet } from '../../features/doc-sets/api/get-doc-set.js';
import { NavList } from './nav-list.js';
import { UserMenu } from './user-menu.js';
import { useHealth } from '../../features/health/api/get-health.js';

const DRAWER_WIDTH = 248;

function DocSetSections({ docSetId }: { docSetId: string }) {
  const session = useSession();
  const docSet = useDocSet(docSetId);
  if (!session) return null;
  return <NavList title={docSet.data?.name ?? 'Doc set'} items={docSetNav} role={session.user.role} docSetId={docSetId} />;
}

/** Left navigation + top bar around every signed-in screen. */
export function AppShell() {
  const session = useSession();
  const { docSetId } = useParams();
  const health = useHealth();
  const role = session?.user.role ?? 'viewer';
  return (
    <Box sx={{ display: 'flex', minHeight: '100vh' }}>
      <Box
        component="a"
        href="#main"
        sx={{ position: 'absolute', left: -9999, '&:focus': { left: 8, top: 8, zIndex: 2000, bgcolor: 'background.paper', p: 1 } }}
      >
        Skip to content
      </Box>
      <Drawer
        variant="permanent"
        sx={{ width: DRAWER_WIDTH, flexShrink: 0, '& .MuiDrawer-paper': { width: DRAWER_WIDTH, bgcolor: 'background.default' } }}
      >
        <Toolbar component={RouterLink} to="/" sx={{ gap: 1.5, textDecoration: 'none', color: 'primary.main' }}>
          <LogoMark size={30} />
          <Typography variant="h3" component="span" sx={{ fontWeight: 600 }}>
            Linkloom
          </Typography>
        </Toolbar>
        <Divider />
        <NavList items={globalNav} role={role} />
        {docSetId && <DocSetSections docSetId={docSetId} />}
        <Box sx={{ flex: 1 }} />
        <NavList title="Administration" items={adminNav} role={role} />
      </Drawer>
      <Box sx={{ flex: 1, minWidth: 0, display: 'flex', flexDirection: 'column' }}>
        <Toolbar variant="dense" sx={{ justifyContent: 'flex-end', gap: 2, borderBottom: 1, borderColor: 'divider' }}>
          {health.data?.demo && (
            <Alert severity="info" variant="outlined" sx={{ py: 0, flex: 1 }}>
              Demo data: this Linkloom holds an invented handbook to explore. Changes here may be reset.
            </Alert>
          )}
          <UserMenu />
        </Toolbar>
        <Box
          component="main"
          id="main"
          tabIndex={-1}
          sx={{ p: { xs: 2, md: 3 }, maxWidth: 1600, width: '100%', mx: 'auto', outline: 'none' }}
        >
          <Suspense fallback={<LinearProgress aria-label="Loading screen" />}>
            <Outlet />
          </Suspense>
        </Box>
      </Box>
    </Box>
  );
}
