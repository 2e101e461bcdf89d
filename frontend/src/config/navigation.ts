import type { ComponentType } from 'react';
import type { Role } from '@linkloom/shared';
import DashboardOutlined from '@mui/icons-material/DashboardOutlined';
import DescriptionOutlined from '@mui/icons-material/DescriptionOutlined';
import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';
import HubOutlined from '@mui/icons-material/HubOutlined';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import TuneOutlined from '@mui/icons-material/TuneOutlined';
import LibraryBooksOutlined from '@mui/icons-material/LibraryBooksOutlined';
import PeopleOutlined from '@mui/icons-material/PeopleOutlined';
import ContentCutOutlined from '@mui/icons-material/ContentCutOutlined';
import AssignmentOutlined from '@mui/icons-material/AssignmentOutlined';
import MailOutlined from '@mui/icons-material/MailOutlined';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';

export interface NavItem {
  id: string;
  label: string;
  icon: ComponentType;
  /** Doc-set sections receive the open doc set's id. */
  to: (docSetId: string) => string;
  minRole: Role;
  /** The most a role may hold to see the entry (an entry only for readers, say); none when absent. */
  maxRole?: Role;
  /** `true` when only the exact path counts as "here" (Overview vs its sub-pages). */
  end?: boolean;
}

const docSetBase = (id: string) => `/doc-sets/${encodeURIComponent(id)}`;

/** Sections of an open doc set, in reading order. */
export const docSetNav: NavItem[] = [
  { id: 'overview', label: 'Overview', icon: DashboardOutlined, to: docSetBase, minRole: 'viewer', end: true },
  { id: 'pages', label: 'Pages', icon: DescriptionOutlined, to: (id) => `${docSetBase(id)}/pages`, minRole: 'viewer' },
  { id: 'findings', label: 'Findings', icon: ReportProblemOutlined, to: (id) => `${docSetBase(id)}/findings`, minRole: 'viewer' },
  { id: 'link-map', label: 'Link map', icon: HubOutlined, to: (id) => `${docSetBase(id)}/map`, minRole: 'viewer' },
  { id: 'search', label: 'Search', icon: SearchOutlined, to: (id) => `${docSetBase(id)}/search`, minRole: 'viewer' },
  { id: 'pruning', label: 'Pruning', icon: ContentCutOutlined, to: (id) => `${docSetBase(id)}/pruning`, minRole: 'writer' },
  { id: 'runs', label: 'Runs', icon: HistoryOutlined, to: (id) => `${docSetBase(id)}/runs`, minRole: 'viewer' },
  { id: 'settings', label: 'Settings', icon: TuneOutlined, to: (id) => `${docSetBase(id)}/settings`, minRole: 'viewer' },
];

/** Always-present entries. */
export const globalNav: NavItem[] = [
  { id: 'doc-sets', label: 'Doc sets', icon: LibraryBooksOutlined, to: () => '/', minRole: 'viewer', end: true },
  // Viewers are never assigned work: they read all tasks (docs/mail-and-work.md, "What a viewer sees").
  { id: 'tasks', label: 'My tasks', icon: AssignmentOutlined, to: () => '/tasks', minRole: 'writer' },
  { id: 'all-tasks', label: 'Tasks', icon: AssignmentOutlined, to: () => '/tasks', minRole: 'viewer', maxRole: 'viewer' },
];

/** Administration entries. */
export const adminNav: NavItem[] = [
  { id: 'users', label: 'Users', icon: PeopleOutlined, to: () => '/admin/users', minRole: 'admin' },
  { id: 'mail', label: 'Mail', icon: MailOutlined, to: () => '/admin/mail', minRole: 'admin' },
  { id: 'schedule', label: 'Nightly runs', icon: ScheduleOutlined, to: () => '/admin/schedule', minRole: 'editor' },
];
