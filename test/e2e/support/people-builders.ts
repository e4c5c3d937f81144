import type { INestApplication } from '@nestjs/common';
import { getModelToken } from '@nestjs/sequelize';
import type { Role, SessionResponse } from '@tallyloom/core';
import { hashPassword } from '../../../services/api/src/auth/passwords/password-hasher';
import { User } from '../../../services/api/src/users/models/user.model';
import { uniqueSuffix, type TestApp } from './test-app';

export interface BuiltUser {
  user: User;
  email: string;
  password: string;
}

/** Builds a person who belongs to one test: `aUser().withRole('chapter_lead').inChapter(id).build(app)`. */
export function aUser() {
  const suffix = uniqueSuffix().toLowerCase();
  const fields = {
    email: `person.${suffix}@test.example`,
    displayName: `Test Person ${suffix}`,
    role: 'network_admin' as Role,
    regionId: null as number | null,
    chapterId: null as number | null,
    active: true,
    password: `woolly-mammoth-${suffix}` as string | null,
  };
  const builder = {
    withRole(role: Role) {
      fields.role = role;
      return builder;
    },
    inRegion(regionId: number) {
      fields.regionId = regionId;
      return builder;
    },
    inChapter(chapterId: number) {
      fields.chapterId = chapterId;
      return builder;
    },
    withEmail(email: string) {
      fields.email = email;
      return builder;
    },
    withPassword(password: string) {
      fields.password = password;
      return builder;
    },
    /** Invited and not yet accepted: no password. */
    invited() {
      fields.password = null;
      return builder;
    },
    deactivated() {
      fields.active = false;
      return builder;
    },
    async build(app: INestApplication): Promise<BuiltUser> {
      const users = app.get<typeof User>(getModelToken(User));
      const user = await users.create({
        email: fields.email,
        displayName: fields.displayName,
        role: fields.role,
        regionId: fields.regionId,
        chapterId: fields.chapterId,
        active: fields.active,
        passwordHash: fields.password ? await hashPassword(fields.password) : null,
        invitedAt: new Date(),
      });
      return { user, email: fields.email, password: fields.password ?? '' };
    },
  };
  return builder;
}

/** Signs in through the real endpoint; returns the session and the refresh cookie as sent. */
export async function signIn(
  testApp: TestApp,
  email: string,
  password: string,
): Promise<{ session: SessionResponse; token: string; refreshCookie: string }> {
  const response = await testApp
    .http()
    .post('/api/auth/sign-in')
    .send({ email, password })
    .expect(200);
  const session = response.body as SessionResponse;
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const refreshCookie = cookies.find((c) => c.startsWith('tl_refresh='))?.split(';')[0] ?? '';
  return { session, token: session.accessToken, refreshCookie };
}

/** A signed-in person of the given role and scope, ready to call the API with `token`. */
export async function signedIn(
  testApp: TestApp,
  role: Role,
  scope: { regionId?: number; chapterId?: number } = {},
): Promise<BuiltUser & { token: string }> {
  let builder = aUser().withRole(role);
  if (scope.regionId) builder = builder.inRegion(scope.regionId);
  if (scope.chapterId) builder = builder.inChapter(scope.chapterId);
  const built = await builder.build(testApp.app);
  const { token } = await signIn(testApp, built.email, built.password);
  return { ...built, token };
}
