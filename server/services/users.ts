import type { SignedInUser } from '../../shared/schemas/auth';
import type { List, PageQuery } from '../../shared/schemas/common';
import { notifyPrefsOf } from '../../shared/schemas/notification';
import type { CreateUserInput, UpdateMeInput, UpdateUserInput, User } from '../../shared/schemas/user';
import { createUserSchema } from '../../shared/schemas/user';
import { assertStrongPassword } from '../auth/password-strength';
import { hashPassword } from '../auth/passwords';
import type { SiteData } from '../data/site-data';
import type { UserEntity } from '../db/entities/user.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { paginate } from '../lib/paginate';
import { siteForWrite } from '../lib/site-scope';
import { changedFields, recordAudit, type Actor } from './audit';
import type { EventBus } from './events';

/** What the sign-in session carries about its user. */
export function toSignedInUser(user: UserEntity): SignedInUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, units: user.units, siteId: user.siteId, notify: notifyPrefsOf(user.role, user.notify) };
}

export function toUserDto(user: UserEntity): User {
  return { ...toSignedInUser(user), disabled: user.disabled, createdAt: user.createdAt };
}

async function requireSite(tx: SiteData, siteId: number): Promise<void> {
  if (!(await tx.sites.existsBy({ id: siteId }))) throw new AppError('validation_failed', 'That site does not exist', { siteId: 'Choose a site' });
}

export function createUserService(data: SiteData, events: EventBus, clock: Clock = systemClock) {
  async function applyUpdate(id: number, patch: UpdateUserInput, actor: Actor, summary: string): Promise<UserEntity> {
    const now = clock.now();
    const { password, ...fields } = patch;
    if (password) {
      const user = await data.users.findOneBy({ id });
      if (!user) throw notFound('User');
      await assertStrongPassword(password, [user.email, fields.name ?? user.name]);
    }
    const passwordHash = password ? await hashPassword(password) : undefined;
    const changed = await data.transaction(async (tx) => {
      const user = await tx.users.findOneBy({ id });
      if (!user) throw notFound('User');
      if (fields.siteId !== undefined) await requireSite(tx, fields.siteId);
      const changes = changedFields(user, fields);
      if (passwordHash) changes.password = { from: '…', to: 'changed' };
      // A new password ends every sign-in made with the old one (see passport.ts).
      Object.assign(user, fields, passwordHash ? { passwordHash, sessionEpoch: user.sessionEpoch + 1 } : {}, { updatedAt: now.toISOString() });
      await tx.users.save(user);
      await recordAudit(tx, actor, { action: 'update', entity: 'user', entityId: id, summary: `${summary} ${user.email}`, changes, siteId: user.siteId }, now);
      return user;
    });
    // Every instance forgets the signed-in user it holds: a new role, site or password counts from the next request.
    events.publish({ type: 'user.changed', id, siteId: null });
    return changed;
  }

  return {
    list(query: PageQuery): Promise<List<User>> {
      return paginate(data.users, query, { order: { name: 'ASC', id: 'ASC' } }, toUserDto);
    },

    /** Left out of the input, the new user joins the creating admin's own site. */
    async create(input: CreateUserInput, actor: Actor): Promise<User> {
      const { password, siteId: requested, ...fields } = createUserSchema.parse(input);
      await assertStrongPassword(password, [fields.email, fields.name]);
      const siteId = siteForWrite(data.scope, requested);
      const passwordHash = await hashPassword(password);
      const now = clock.now();
      return data.transaction(async (tx) => {
        if (await tx.acrossSites.users.existsBy({ email: fields.email })) {
          throw new AppError('conflict', 'A user with this e-mail already exists', { email: 'Already in use' });
        }
        await requireSite(tx, siteId);
        const user = await tx.users.save(tx.users.create({ ...fields, siteId, passwordHash, disabled: false, createdAt: now.toISOString(), updatedAt: now.toISOString() }));
        await recordAudit(tx, actor, { action: 'create', entity: 'user', entityId: user.id, summary: `Added user ${user.email} as ${user.role}`, siteId }, now);
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

    async updateSelf(id: number, patch: UpdateMeInput, actor: Actor): Promise<SignedInUser> {
      return toSignedInUser(await applyUpdate(id, patch, actor, 'Changed own preferences'));
    },
  };
}

export type UserService = ReturnType<typeof createUserService>;
