import type { Role } from './permissions';

/**
 * How roles read everywhere people see them: the interface and the mail the server sends.
 * @example ROLE_LABELS.planner // 'Well planner'
 */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  geoscientist: 'Geoscientist',
  planner: 'Well planner',
  viewer: 'Viewer',
};
