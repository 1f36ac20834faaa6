import type { EntityManager } from 'typeorm';
import type { Role } from '../../../shared/roles';
import { notFound } from '../../http/errors';
import { User } from './user.entity';

export const findUserByEmail = (manager: EntityManager, email: string) =>
  manager.getRepository(User).findOneBy({ email: email.toLowerCase() });

export const findUserById = (manager: EntityManager, id: number) => manager.getRepository(User).findOneBy({ id });

/** Load a user for an update, holding its row lock until the transaction ends. */
export async function lockUser(manager: EntityManager, id: number): Promise<User> {
  const user = await manager.getRepository(User).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!user) throw notFound('That account');
  return user;
}

export interface UserSearch {
  q?: string;
  role?: Role;
  page: number;
  pageSize: number;
}

/** People list for administrators: search by name or e-mail, newest first. */
export async function searchUsers(manager: EntityManager, search: UserSearch): Promise<[User[], number]> {
  const query = manager.getRepository(User).createQueryBuilder('u');
  if (search.q) {
    const like = `%${search.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query.andWhere('(u.email LIKE :like OR u.display_name LIKE :like)', { like });
  }
  if (search.role) query.andWhere('u.role = :role', { role: search.role });
  return query
    .orderBy('u.id', 'DESC')
    .skip((search.page - 1) * search.pageSize)
    .take(search.pageSize)
    .getManyAndCount();
}
