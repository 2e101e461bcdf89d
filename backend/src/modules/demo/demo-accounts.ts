import type { Role } from '@linkloom/shared';

export const DEMO_PASSWORD = 'linkloom-demo';

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@demo.linkloom.test', name: 'Ada Admin (demo)', role: 'admin' },
  { email: 'editor@demo.linkloom.test', name: 'Edda Editor (demo)', role: 'editor' },
  { email: 'writer@demo.linkloom.test', name: 'Wren Writer (demo)', role: 'writer' },
  { email: 'viewer@demo.linkloom.test', name: 'Vic Viewer (demo)', role: 'viewer' },
];
