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
import { paths } from '@/config/paths';

export type NavItem = {
  to: string;
  label: string;
  icon: ComponentType<{ 'aria-hidden'?: boolean }>;
  soon?: boolean;
};

export type NavGroup = { label: string | null; items: NavItem[] };

export const navGroups: NavGroup[] = [
  {
    label: null,
    items: [{ to: paths.overview, label: 'Overview', icon: HomeIcon }],
  },
  {
    label: 'Regression',
    items: [
      { to: paths.playground, label: 'Playground', icon: MixerHorizontalIcon },
      { to: paths.datasets, label: 'Datasets', icon: TableIcon },
    ],
  },
  {
    label: 'Organisation',
    items: [
      { to: paths.apiKeys, label: 'API keys', icon: LockClosedIcon },
      { to: paths.team, label: 'Team', icon: GroupIcon },
      { to: paths.usage, label: 'Usage', icon: BarChartIcon },
      { to: paths.billing, label: 'Billing', icon: CardStackIcon, soon: true },
    ],
  },
];
