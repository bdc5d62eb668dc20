import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type {
  UserCreateRequest,
  UserUpdateRequest,
  userListQuery,
} from '../../../shared/schemas/users';
import { growers } from '../growers/growers.service';
import { hashPassword } from '../session/passwords';
import { SessionUsers } from '../session/session-users';
import { User } from './user.entity';

function present(user: User) {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    growerId: user.growerId,
    units: user.units,
    active: user.active,
    version: user.version,
  };
}

/** People of the operation: the owner invites, changes roles and deactivates. */
export class UsersService {
  private readonly sessions: SessionUsers;

  constructor(private readonly db: DataSource) {
    this.sessions = new SessionUsers(db);
  }

  private repo(db: DataSource | EntityManager = this.db) {
    return db.getRepository(User);
  }

  private async find(db: DataSource | EntityManager, actor: Actor, id: string) {
    const user = await this.repo(db).findOneBy({ id, operationId: actor.operationId });
    if (!user) throw AppError.notFound('User');
    return user;
  }

  private async checkGrower(
    tx: EntityManager,
    actor: Actor,
    role: string,
    growerId: string | null | undefined,
  ) {
    if (role === 'grower' && !growerId)
      throw AppError.validation([
        { field: 'growerId', message: 'A grower user belongs to a grower.' },
      ]);
    if (role !== 'grower' && growerId)
      throw AppError.validation([
        { field: 'growerId', message: 'Only grower users belong to a grower.' },
      ]);
    if (growerId) {
      await growers.get(tx, actor.operationId, growerId).catch(() => {
        throw AppError.validation([{ field: 'growerId', message: 'No such grower.' }]);
      });
    }
  }

  async list(actor: Actor, query: z.infer<typeof userListQuery>) {
    const qb = this.repo()
      .createQueryBuilder('u')
      .where('u.operationId = :op', { op: actor.operationId });
    if (query.role) qb.andWhere('u.role = :role', { role: query.role });
    if (query.q)
      qb.andWhere('(u.name ILIKE :q OR u.email ILIKE :q)', {
        q: `%${query.q.replace(/[%_\\]/g, '\\$&')}%`,
      });
    const [items, total] = await qb.orderBy('u.name').getManyAndCount();
    return { items: items.map(present), total };
  }

  async get(actor: Actor, id: string) {
    return present(await this.find(this.db, actor, id));
  }

  async create(actor: Actor, input: UserCreateRequest) {
    return this.db.transaction(async (tx) => {
      await this.checkGrower(tx, actor, input.role, input.growerId);
      const taken = await tx.query(`SELECT 1 FROM users WHERE lower(email) = lower($1)`, [
        input.email,
      ]);
      if (taken.length)
        throw AppError.validation([
          { field: 'email', message: 'This e-mail already has an account.' },
        ]);
      const saved = await this.repo(tx).save(
        this.repo(tx).create({
          operationId: actor.operationId,
          email: input.email,
          name: input.name,
          role: input.role,
          growerId: input.growerId ?? null,
          passwordHash: await hashPassword(input.password),
          units: 'imperial',
          active: true,
          version: 1,
        }),
      );
      return present(await this.find(tx, actor, saved.id));
    });
  }

  async update(actor: Actor, id: string, { version, ...changes }: UserUpdateRequest) {
    const user = await this.db.transaction(async (tx) => {
      const before = await this.find(tx, actor, id);
      const role = changes.role ?? before.role;
      const growerId =
        changes.growerId !== undefined
          ? changes.growerId
          : role === 'grower'
            ? before.growerId
            : null;
      await this.checkGrower(tx, actor, role, growerId);
      if (
        id === actor.id &&
        (changes.active === false || (changes.role && changes.role !== 'owner'))
      ) {
        throw AppError.validation([
          {
            field: changes.active === false ? 'active' : 'role',
            message: 'You cannot deactivate or demote yourself.',
          },
        ]);
      }
      const result = await tx
        .createQueryBuilder()
        .update(User)
        .set({
          name: changes.name,
          role,
          growerId,
          active: changes.active,
          version: () => 'version + 1',
        } as never)
        .where('id = :id AND operation_id = :op AND version = :version', {
          id,
          op: actor.operationId,
          version,
        })
        .execute();
      if (result.affected !== 1) throw AppError.staleVersion(before.version);
      const after = await this.find(tx, actor, id);
      // A deactivated user or one whose role changed signs in again (or not at all).
      if (!after.active || after.role !== before.role) await this.sessions.endSessions(id);
      return after;
    });
    return present(user);
  }

  /** People are deactivated, not deleted: the same as PATCH { active: false }. */
  async archive(actor: Actor, id: string, version: number) {
    return this.update(actor, id, { version, active: false });
  }
}
