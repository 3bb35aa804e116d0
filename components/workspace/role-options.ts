import type { Role } from '@/lib/roles';

/** What each role may do (PRODUCT.md §5), as the member list and invite form describe them. */
export const ROLE_OPTIONS: ReadonlyArray<{ value: Role; label: string }> = [
  { value: 'viewer', label: 'Viewer — read and print' },
  { value: 'technician', label: 'Technician — templates, build sheets, printing' },
  { value: 'owner', label: 'Owner — members, settings, everything' },
];
