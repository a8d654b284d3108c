import type { UserDto } from '@app/shared';
import type { User } from '../../models';

/** What leaves the server about a user: never the password hash. */
export function toUserDto(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    roles: user.roleNames,
    emailVerified: user.emailVerifiedAt !== null,
    unitSystem: user.unitSystem,
    memberSince: user.createdAt.toISOString(),
    notificationDigest: user.digestOptIn ?? false,
  };
}
