import { defineRoute } from '../../http/route-table';
import { IdParamSchema, UserCreateSchema, UserUpdateSchema, ROLE_SETS } from '../../../shared/schemas/auth';
import * as service from './service';

export const userRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/users',
    access: ROLE_SETS.admin,
    summary: 'People of the organisation',
    handler: ({ user }) => service.listUsers(user),
  }),
  defineRoute({
    method: 'post',
    path: '/api/users',
    access: ROLE_SETS.admin,
    summary: 'Invite a person',
    body: UserCreateSchema,
    handler: ({ user, body }) => service.inviteUser(user, body),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/users/:id',
    access: ROLE_SETS.admin,
    summary: 'Change roles, name, or deactivate',
    params: IdParamSchema,
    body: UserUpdateSchema,
    handler: ({ user, params, body }) => service.updateUser(user, params.id, body),
  }),
];
