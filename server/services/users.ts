import { inTransaction } from '../db/transaction';
import type { DataSource, EntityManager } from 'typeorm';
import type { SessionUser } from '../../shared/schemas/auth';
import { defaultNotifyPrefs } from '../../shared/schemas/notification';
import type { List, PageQuery } from '../../shared/schemas/common';
import type { CreateUserInput, UpdateMeInput, UpdateUserInput, User } from '../../shared/schemas/user';
import { createUserSchema } from '../../shared/schemas/user';
import { assertStrongPassword } from '../auth/password-strength';
import { hashPassword } from '../auth/passwords';
import { SiteEntity } from '../db/entities/site.entity';
import { UserEntity } from '../db/entities/user.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { paginate } from '../lib/paginate';
import { changedFields, recordAudit, type Actor } from './audit';

export function toSessionUser(user: UserEntity): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, units: user.units, siteId: user.siteId, notify: user.notify ?? defaultNotifyPrefs(user.role) };
}

export function toUserDto(user: UserEntity): User {
  return { ...toSessionUser(user), disabled: user.disabled, createdAt: user.createdAt };
}

async function requireSite(manager: EntityManager, siteId: number): Promise<void> {
  if (!(await manager.existsBy(SiteEntity, { id: siteId }))) throw new AppError('validation_failed', 'That site does not exist', { siteId: 'Choose a site' });
}

export function createUserService(dataSource: DataSource, clock: Clock = systemClock) {
  const repo = () => dataSource.getRepository(UserEntity);

  async function applyUpdate(id: number, patch: UpdateUserInput, actor: Actor, summary: string): Promise<UserEntity> {
    const now = clock.now();
    const { password, ...fields } = patch;
    if (password) {
      const user = await repo().findOneBy({ id });
      if (!user) throw notFound('User');
      assertStrongPassword(password, [user.email, fields.name ?? user.name]);
    }
    const passwordHash = password ? await hashPassword(password) : undefined;
    return inTransaction(dataSource, async (manager) => {
      const user = await manager.findOneBy(UserEntity, { id });
      if (!user) throw notFound('User');
      if (fields.siteId !== undefined) await requireSite(manager, fields.siteId);
      const changes = changedFields(user, fields);
      if (passwordHash) changes.password = { from: '…', to: 'changed' };
      // A new password ends every sign-in made with the old one (see passport.ts).
      Object.assign(user, fields, passwordHash ? { passwordHash, sessionEpoch: user.sessionEpoch + 1 } : {}, { updatedAt: now.toISOString() });
      await manager.save(user);
      await recordAudit(manager, actor, { action: 'update', entity: 'user', entityId: id, summary: `${summary} ${user.email}`, changes }, now);
      return user;
    });
  }

  return {
    list(query: PageQuery): Promise<List<User>> {
      return paginate(repo(), query, { order: { name: 'ASC', id: 'ASC' } }, toUserDto);
    },

    /** `homeSiteId` is where the user goes when the input names no site: the creating admin's. */
    async create(input: CreateUserInput, actor: Actor, homeSiteId = 1): Promise<User> {
      const { password, siteId = homeSiteId, ...fields } = createUserSchema.parse(input);
      assertStrongPassword(password, [fields.email, fields.name]);
      const passwordHash = await hashPassword(password);
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        if (await manager.existsBy(UserEntity, { email: fields.email })) {
          throw new AppError('conflict', 'A user with this e-mail already exists', { email: 'Already in use' });
        }
        await requireSite(manager, siteId);
        const user = manager.create(UserEntity, { ...fields, siteId, passwordHash, disabled: false, createdAt: now.toISOString(), updatedAt: now.toISOString() });
        await manager.save(user);
        await recordAudit(manager, actor, { action: 'create', entity: 'user', entityId: user.id, summary: `Added user ${user.email} as ${user.role}` }, now);
        return toUserDto(user);
      });
    },

    async update(id: number, patch: UpdateUserInput, actor: Actor): Promise<User> {
      if (actor.id === id && (patch.disabled === true || (patch.role && patch.role !== 'admin'))) {
        // An admin locking themselves out would leave the shop without anyone to undo it.
        throw new AppError('conflict', 'You cannot disable yourself or take away your own admin role', { role: 'Ask another admin' });
      }
      return toUserDto(await applyUpdate(id, patch, actor, 'Changed user'));
    },

    async updateSelf(id: number, patch: UpdateMeInput, actor: Actor): Promise<SessionUser> {
      return toSessionUser(await applyUpdate(id, patch, actor, 'Changed own preferences'));
    },
  };
}

export type UserService = ReturnType<typeof createUserService>;
