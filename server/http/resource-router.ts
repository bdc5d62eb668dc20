import { Router } from 'express';
import type { z } from 'zod';
import { parseOrThrow } from '../errors/validate';
import { actorOf, allow, type Actor } from '../middleware/authorise';
import { archiveRequest } from '../../shared/schemas/common';
import type { Role } from '../../shared/schemas/users';
import { idParam } from './params';

/** What a resource's service offers the five standard routes. */
export interface ResourceService<L, C, U> {
  list(actor: Actor, query: L): Promise<unknown>;
  get(actor: Actor, id: string): Promise<unknown>;
  create(actor: Actor, input: C): Promise<unknown>;
  update(actor: Actor, id: string, input: U): Promise<unknown>;
  archive(actor: Actor, id: string, version: number): Promise<unknown>;
}

interface ResourceRoutes<L, C, U> {
  listSchema: z.ZodType<L>;
  createSchema: z.ZodType<C>;
  updateSchema: z.ZodType<U>;
  readRoles: Role[];
  writeRoles: Role[];
}

/**
 * The standard routes of a resource: GET / (list), GET /:id, POST /, PATCH /:id (with version),
 * POST /:id/archive (with version). Each authorises, validates and hands over to the service.
 */
export function resourceRouter<L, C, U>(
  service: ResourceService<L, C, U>,
  routes: ResourceRoutes<L, C, U>,
) {
  const router = Router();
  const read = allow(...routes.readRoles);
  const write = allow(...routes.writeRoles);
  router.get('/', read, async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(routes.listSchema, req.query)));
  });
  router.get('/:id', read, async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.post('/', write, async (req, res) => {
    res
      .status(201)
      .json(await service.create(actorOf(req), parseOrThrow(routes.createSchema, req.body)));
  });
  router.patch('/:id', write, async (req, res) => {
    res.json(
      await service.update(actorOf(req), idParam(req), parseOrThrow(routes.updateSchema, req.body)),
    );
  });
  router.post('/:id/archive', write, async (req, res) => {
    res.json(
      await service.archive(
        actorOf(req),
        idParam(req),
        parseOrThrow(archiveRequest, req.body).version,
      ),
    );
  });
  return router;
}
