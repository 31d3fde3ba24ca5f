import type { InspectionStatus } from '@/db/schema/inspections';
import type { Role } from '@/db/schema/users';

export type { Role };

export const ROLE_LABELS: Record<Role, string> = {
  seller: 'Seller',
  inspector: 'Inspector',
  buyer: 'Buyer',
  dealer: 'Dealer',
  admin: 'Coordinator',
};

/** Everything a person can do in Waygrade. Server actions name one of these; the UI asks the same table. */
export const PERMISSIONS = [
  'machine.list.own',
  'machine.edit.own',
  'inspection.request',
  'inspection.view.own',
  'inspection.queue',
  'inspection.book',
  'inspection.assign',
  'inspection.cancel',
  'survey.edit.assigned',
  'survey.submit.assigned',
  'report.review',
  'report.release',
  'report.browse',
  'report.buy',
  'report.download.granted',
  'reinspection.request',
  'compare.use',
  'fees.manage',
  'payments.refund',
  'market.manage',
  'users.manage',
  'audit.view',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  seller: ['machine.list.own', 'machine.edit.own', 'inspection.request', 'inspection.view.own', 'report.download.granted', 'reinspection.request'],
  inspector: ['survey.edit.assigned', 'survey.submit.assigned', 'report.download.granted'],
  buyer: ['report.browse', 'report.buy', 'report.download.granted', 'reinspection.request'],
  dealer: ['report.browse', 'report.buy', 'report.download.granted', 'reinspection.request', 'compare.use'],
  admin: [
    'inspection.queue',
    'inspection.book',
    'inspection.assign',
    'inspection.cancel',
    'report.review',
    'report.release',
    'report.browse',
    'report.download.granted',
    'compare.use',
    'fees.manage',
    'payments.refund',
    'market.manage',
    'users.manage',
    'audit.view',
  ],
};

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return role ? ROLE_PERMISSIONS[role].includes(permission) : false;
}

/** Which role may move an inspection from one status to the next. */
export const STATUS_TRANSITIONS: ReadonlyArray<{ from: InspectionStatus; to: InspectionStatus; roles: readonly Role[] }> = [
  { from: 'requested', to: 'booked', roles: ['admin'] },
  { from: 'booked', to: 'booked', roles: ['admin'] },
  { from: 'booked', to: 'on_site', roles: ['inspector'] },
  { from: 'on_site', to: 'in_review', roles: ['inspector'] },
  { from: 'in_review', to: 'on_site', roles: ['admin'] },
  { from: 'in_review', to: 'released', roles: ['admin'] },
  // A released report is corrected by reopening the survey; the correction is released as a new version.
  { from: 'released', to: 'on_site', roles: ['admin'] },
  { from: 'requested', to: 'cancelled', roles: ['seller', 'admin'] },
  { from: 'booked', to: 'cancelled', roles: ['seller', 'admin'] },
  { from: 'on_site', to: 'cancelled', roles: ['admin'] },
];

export function mayTransition(role: Role, from: InspectionStatus, to: InspectionStatus): boolean {
  return STATUS_TRANSITIONS.some((t) => t.from === from && t.to === to && t.roles.includes(role));
}

/** Navigation of the signed-in area by role: only pages that exist. */
export const ROLE_NAVIGATION: Record<Role, ReadonlyArray<{ href: string; label: string }>> = {
  seller: [
    { href: '/dashboard', label: 'Overview' },
    { href: '/machines', label: 'Machines' },
    { href: '/purchases', label: 'Downloads' },
  ],
  inspector: [{ href: '/dashboard', label: 'Overview' }, { href: '/jobs', label: 'My jobs' }],
  buyer: [
    { href: '/dashboard', label: 'Overview' },
    { href: '/reports', label: 'Reports' },
    { href: '/purchases', label: 'Purchases' },
  ],
  dealer: [
    { href: '/dashboard', label: 'Overview' },
    { href: '/compare', label: 'Compare' },
    { href: '/reports', label: 'Reports' },
    { href: '/purchases', label: 'Purchases' },
  ],
  admin: [
    { href: '/dashboard', label: 'Overview' },
    { href: '/inspections', label: 'Inspections' },
    { href: '/reports', label: 'Reports' },
    { href: '/compare', label: 'Compare' },
    { href: '/admin/orders', label: 'Orders' },
    { href: '/admin/fees', label: 'Fees' },
    { href: '/admin/market', label: 'Market data' },
    { href: '/admin/people', label: 'People' },
    { href: '/admin/audit', label: 'Audit log' },
  ],
};
