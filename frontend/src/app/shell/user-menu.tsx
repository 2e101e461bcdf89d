import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Avatar, Button, Divider, ListItemIcon, Menu, MenuItem, Typography } from '@mui/material';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import NotificationsOutlined from '@mui/icons-material/NotificationsOutlined';
import Logout from '@mui/icons-material/Logout';
import { useSession } from '../../lib/session.js';
import { useSignOut } from '../../features/auth/api/sign-out.js';

export function UserMenu() {
  const session = useSession();
  const navigate = useNavigate();
  const signOut = useSignOut();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  if (!session) return null;
  const { user } = session;
  const close = () => setAnchor(null);
  const entries = [
    { label: 'Notifications', icon: NotificationsOutlined, act: () => navigate('/account/notifications') },
    { label: 'Change password', icon: KeyOutlined, act: () => navigate('/account') },
    { label: 'Sign out', icon: Logout, act: () => signOut.mutate(undefined, { onSettled: () => navigate('/sign-in') }) },
  ];
  return (
    <>
      <Button
        color="inherit"
        onClick={(e) => setAnchor(e.currentTarget)}
        aria-haspopup="menu"
        aria-label={`Account menu for ${user.name}`}
        startIcon={
          <Avatar sx={{ width: 28, height: 28, fontSize: 14, bgcolor: 'secondary.main' }}>{user.name.slice(0, 1).toUpperCase()}</Avatar>
        }
      >
        {user.name}
      </Button>
      <Menu anchorEl={anchor} open={anchor !== null} onClose={close}>
        <MenuItem disabled sx={{ opacity: '1 !important', display: 'block' }}>
          <Typography variant="body2">{user.email}</Typography>
          <Typography variant="caption" color="text.secondary">
            Role: {user.role}
          </Typography>
        </MenuItem>
        <Divider />
        {entries.map(({ label, icon: Icon, act }) => (
          <MenuItem
            key={label}
            onClick={() => {
              close();
              act();
            }}
          >
            <ListItemIcon>
              <Icon fontSize="small" />
            </ListItemIcon>
            {label}
          </MenuItem>
        ))}
      </Menu>
    </>
  );
}
