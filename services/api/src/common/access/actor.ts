import type { Role } from '@tallyloom/core';

/** The signed-in person a request acts for, as loaded from the database on every request. */
export interface Actor {
  id: number;
  email: string;
  role: Role;
  /** The coordinator's region, or the region of the chapter lead's chapter. */
  regionId: number | null;
  /** The chapter lead's chapter. */
  chapterId: number | null;
}
