import type { Role } from '@linkloom/shared';

export const roleHelp: Record<Role, string> = {
  admin: 'Everything, including users and mail settings.',
  editor: 'Creates doc sets, uploads archives, changes settings and starts runs.',
  writer: 'Works on findings and tasks for pages.',
  viewer: 'Reads reports; changes nothing.',
};
