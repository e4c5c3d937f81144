import { ROLE_SCOPE, type Role } from '@tallyloom/core';

export interface ScopedPerson {
  role: Role;
  regionName: string | null;
  chapterName: string | null;
}

/** Where a person's reach ends, in words: "Whole network", a region's or a chapter's name. */
export function scopeLabel(person: ScopedPerson): string {
  switch (ROLE_SCOPE[person.role]) {
    case 'region':
      return person.regionName ?? 'No region set';
    case 'chapter':
      return person.chapterName ?? 'No chapter set';
    default:
      return 'Whole network';
  }
}
