import { NavLink, useLocation } from 'react-router';
import { List, ListItemButton, ListItemIcon, ListItemText, ListSubheader } from '@mui/material';
import { roleAtLeast, type Role } from '@linkloom/shared';
import type { NavItem } from '../../config/navigation.js';

interface NavListProps {
  title?: string;
  items: NavItem[];
  role: Role;
  docSetId?: string;
}

function isHere(pathname: string, target: string, end?: boolean): boolean {
  if (end) return pathname === target || pathname === `${target}/`;
  return pathname === target || pathname.startsWith(`${target}/`);
}

/** Renders a nav config list, leaving out entries the role cannot use. */
export function NavList({ title, items, role, docSetId = '' }: NavListProps) {
  const { pathname } = useLocation();
  const visible = items.filter((item) => roleAtLeast(role, item.minRole) && (!item.maxRole || roleAtLeast(item.maxRole, role)));
  if (visible.length === 0) return null;
  return (
    <List
      dense
      component="nav"
      aria-label={title ?? 'Main'}
      subheader={
        title ? (
          <ListSubheader component="div" sx={{ bgcolor: 'transparent', lineHeight: '32px' }}>
            {title}
          </ListSubheader>
        ) : undefined
      }
    >
      {visible.map((item) => {
        const to = item.to(docSetId);
        const here = isHere(pathname, to, item.end);
        const Icon = item.icon;
        return (
          <ListItemButton
            key={item.id}
            component={NavLink}
            to={to}
            end={item.end}
            selected={here}
            aria-current={here ? 'page' : undefined}
            sx={{ borderRadius: 2, mx: 1 }}
          >
            <ListItemIcon sx={{ minWidth: 36 }}>
              <Icon />
            </ListItemIcon>
            <ListItemText primary={item.label} />
          </ListItemButton>
        );
      })}
    </List>
  );
}
