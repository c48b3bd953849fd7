import {
  BarChartIcon,
  CardStackIcon,
  GroupIcon,
  HomeIcon,
  LockClosedIcon,
  MixerHorizontalIcon,
  TableIcon,
} from '@radix-ui/react-icons';
import type { ComponentType } from 'react';
import type { TeamSection } from '@/config/paths';
import { roleAllows, type TeamPermission, type TeamRole } from '@/lib/permissions';

export type NavItem = {
  section: TeamSection;
  label: string;
  icon: ComponentType<{ 'aria-hidden'?: boolean }>;
  /** Shown only to roles with this permission; a section nobody in the role could use stays out of sight. */
  permission: TeamPermission;
  soon?: boolean;
};

export type NavGroup = { label: string | null; items: NavItem[] };

export const navGroups: NavGroup[] = [
  {
    label: null,
    items: [{ section: 'overview', label: 'Overview', icon: HomeIcon, permission: 'team:read' }],
  },
  {
    label: 'Regression',
    items: [
      { section: 'playground', label: 'Playground', icon: MixerHorizontalIcon, permission: 'playground:use' },
      { section: 'datasets', label: 'Datasets', icon: TableIcon, permission: 'datasets:read' },
    ],
  },
  {
    label: 'Organisation',
    items: [
      { section: 'apiKeys', label: 'API keys', icon: LockClosedIcon, permission: 'keys:manage-own' },
      { section: 'members', label: 'Team', icon: GroupIcon, permission: 'members:read' },
      { section: 'usage', label: 'Usage', icon: BarChartIcon, permission: 'usage:read' },
      { section: 'billing', label: 'Billing', icon: CardStackIcon, permission: 'plan:manage', soon: true },
    ],
  },
];

export function navGroupsFor(role: TeamRole): NavGroup[] {
  return navGroups
    .map((group) => ({ ...group, items: group.items.filter((item) => roleAllows(role, item.permission)) }))
    .filter((group) => group.items.length > 0);
}
