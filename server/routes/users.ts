/** Accounts and roles, for admins only (the router is mounted behind allow('admin')). */
import { Router } from 'express';
import { Op, UniqueConstraintError } from 'sequelize';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { auth } from '../auth.js';
import { HttpError, notFound } from '../errors.js';
import { ROLES, type Role } from '../models/user.js';
import { hashPassword } from '../passwords.js';
import { toUser } from '../serialize.js';
import { check, email, idParams, pageQuery, password } from '../validate.js';

const role = z.enum(ROLES as [Role, ...Role[]]);
const name = z.string().trim().min(1).max(200);
const conflict = () => new HttpError(409, 'conflict', 'Another account already uses this e-mail address.');

async function uniqueEmail<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw conflict();
    throw error;
  }
}

export function userRoutes(deps: AppDeps): Router {
  const { models } = deps.db;
  const router = Router();

  router.get('/', async (req, res) => {
    const query = check(z.object({ q: z.string().trim().max(200).optional(), ...pageQuery }), req.query);
    const like = query.q ? `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
    const { rows, count } = await models.User.findAndCountAll({
      where: like ? { [Op.or]: [{ name: { [Op.like]: like } }, { email: { [Op.like]: like } }] } : {},
      order: [
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    });
    res.json({ items: rows.map(toUser), total: count, page: query.page, pageSize: query.pageSize });
  });

  router.post('/', async (req, res) => {
    const body = check(z.object({ name, email, role, password }), req.body);
    const user = await uniqueEmail(async () =>
      models.User.create({
        name: body.name,
        email: body.email,
        role: body.role,
        passwordHash: await hashPassword(body.password),
      }),
    );
    res.status(201).json(toUser(user));
  });

  router.get('/:id', async (req, res) => {
    const { id } = check(idParams, req.params);
    const user = await models.User.findByPk(id);
    if (!user) throw notFound('No such user.');
    res.json(toUser(user));
  });

  router.patch('/:id', async (req, res) => {
    const { id } = check(idParams, req.params);
    const body = check(z.object({ name: name.optional(), email: email.optional(), role: role.optional() }), req.body);
    const user = await models.User.findByPk(id);
    if (!user) throw notFound('No such user.');
    if (user.id === auth(res).user.id && body.role && body.role !== 'admin') {
      throw new HttpError(400, 'invalid-input', 'You cannot take the admin role from yourself.');
    }
    await uniqueEmail(() => user.update(body));
    res.json(toUser(user));
  });

  router.delete('/:id', async (req, res) => {
    const { id } = check(idParams, req.params);
    if (id === auth(res).user.id) throw new HttpError(400, 'invalid-input', 'You cannot delete your own account.');
    const removed = await models.User.destroy({ where: { id } });
    if (removed === 0) throw notFound('No such user.');
    res.status(204).end();
  });

  return router;
}
