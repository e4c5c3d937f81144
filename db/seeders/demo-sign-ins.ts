import type { Role } from '@tallyloom/core';

/**
 * One demo account per role, printed by `npm start`. Invented people at a reserved example
 * domain; the passwords are for the demo data only.
 */
export interface DemoSignIn {
  role: Role;
  roleLabel: string;
  displayName: string;
  email: string;
  password: string;
  /** Region code or chapter name the account is scoped to. */
  regionCode?: string;
  chapterName?: string;
}

export const DEMO_SIGN_INS: DemoSignIn[] = [
  {
    role: 'network_admin',
    roleLabel: 'Network admin',
    displayName: 'Nadia Okafor',
    email: 'admin@emberfold.example',
    password: 'ember-admin-2026',
  },
  {
    role: 'national_staff',
    roleLabel: 'National staff',
    displayName: 'Tomasz Reyes',
    email: 'staff@emberfold.example',
    password: 'ember-staff-2026',
  },
  {
    role: 'regional_coordinator',
    roleLabel: 'Regional coordinator',
    displayName: 'Priya Lindqvist',
    email: 'coordinator.northridge@emberfold.example',
    password: 'ember-coordinator-2026',
    regionCode: 'NR',
  },
  {
    role: 'chapter_lead',
    roleLabel: 'Chapter lead',
    displayName: 'Marguerite Osei',
    email: 'lead.alderfalls@emberfold.example',
    password: 'ember-chapter-2026',
    chapterName: 'Alder Falls',
  },
  {
    role: 'grant_writer',
    roleLabel: 'Grant writer',
    displayName: 'Jonah Whitcombe',
    email: 'grants@emberfold.example',
    password: 'ember-grants-2026',
  },
  {
    role: 'auditor',
    roleLabel: 'Auditor',
    displayName: 'Ingrid Castellanos',
    email: 'audit@emberfold.example',
    password: 'ember-audit-2026',
  },
];
