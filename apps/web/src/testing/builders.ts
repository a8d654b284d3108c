import type { SessionDto, UserDto } from '@app/shared';

let nextId = 1;

/** A verified member of the invented demo club; override what the test is about. */
export function buildUser(overrides: Partial<UserDto> = {}): UserDto {
  const id = overrides.id ?? nextId++;
  return {
    id,
    email: `member${id}@harbour.example`,
    displayName: `Member ${id}`,
    roles: ['member'],
    emailVerified: true,
    unitSystem: 'metric',
    memberSince: '2024-04-01T00:00:00.000Z',
    notificationDigest: false,
    ...overrides,
  };
}

/** A session for `user` (a visitor when null). */
export function buildSession(user: UserDto | null, csrfToken = 'csrf-token-1'): SessionDto {
  return { user, csrfToken };
}
