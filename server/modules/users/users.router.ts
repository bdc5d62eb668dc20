import type { DataSource } from 'typeorm';
import { resourceRouter } from '../../http/resource-router';
import { userCreateRequest, userListQuery, userUpdateRequest } from '../../../shared/schemas/users';
import { UsersService } from './users.service';

/** /api/users: the owner manages the operation's people. */
export function usersRouter(db: DataSource) {
  return resourceRouter(new UsersService(db), {
    listSchema: userListQuery,
    createSchema: userCreateRequest,
    updateSchema: userUpdateRequest,
    readRoles: ['owner'],
    writeRoles: ['owner'],
  });
}
