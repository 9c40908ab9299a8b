import { Router } from 'express';
import type { Member, WorkshopSummary } from '@shared/api/workshops';
import {
  addMemberRequestSchema,
  createWorkshopRequestSchema,
  memberParamsSchema,
  renameWorkshopRequestSchema,
  updateMemberRequestSchema,
  workshopParamsSchema,
} from '@shared/api/workshops';
import { workshopSettingsSchema, type WorkshopSettingsView } from '@shared/api/workshop-settings';
import { can } from '@shared/api/roles';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeWorkshop } from '../access/access.service';
import { saveWorkshopSettings, workshopSettings } from './workshop-settings.service';
import { addMember, createWorkshop, listMembers, listWorkshops, removeMember, renameWorkshop, updateMemberRole } from './workshops.service';

export function workshopsRouter(orm: Orm): Router {
  const router = Router();

  router.get('/workshops', async (req, res) => {
    res.json((await listWorkshops(orm.em, currentUserId(req))) satisfies WorkshopSummary[]);
  });

  router.post('/workshops', async (req, res) => {
    const userId = currentUserId(req);
    const { name } = parseInput(createWorkshopRequestSchema, req.body);
    res.status(201).json((await createWorkshop(orm.em, userId, name)) satisfies WorkshopSummary);
  });

  router.patch('/workshops/:workshopId', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    const role = await authorizeWorkshop(orm.em, userId, workshopId, 'workshop.manage');
    const { name } = parseInput(renameWorkshopRequestSchema, req.body);
    res.json((await renameWorkshop(orm.em, workshopId, role, name)) satisfies WorkshopSummary);
  });

  // Every member reads the settings (they shape what each one sees); only an owner changes them.
  router.get('/workshops/:workshopId/settings', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    const role = await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'read');
    res.json({ settings: await workshopSettings(orm.em, workshopId), canEdit: can(role, 'workshop.manage') } satisfies WorkshopSettingsView);
  });

  router.put('/workshops/:workshopId/settings', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'workshop.manage');
    const settings = parseInput(workshopSettingsSchema, req.body);
    res.json({ settings: await saveWorkshopSettings(orm.em, workshopId, settings), canEdit: true } satisfies WorkshopSettingsView);
  });

  router.get('/workshops/:workshopId/members', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, userId, workshopId, 'read');
    res.json((await listMembers(orm.em, workshopId)) satisfies Member[]);
  });

  router.post('/workshops/:workshopId/members', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, userId, workshopId, 'members.manage');
    const { email, role } = parseInput(addMemberRequestSchema, req.body);
    res.status(201).json((await addMember(orm.em, workshopId, email, role)) satisfies Member);
  });

  router.patch('/workshops/:workshopId/members/:userId', async (req, res) => {
    const me = currentUserId(req);
    const params = parseInput(memberParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, me, params.workshopId, 'members.manage');
    const { role } = parseInput(updateMemberRequestSchema, req.body);
    res.json((await updateMemberRole(orm.em, params.workshopId, params.userId, role)) satisfies Member);
  });

  router.delete('/workshops/:workshopId/members/:userId', async (req, res) => {
    const me = currentUserId(req);
    const params = parseInput(memberParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, me, params.workshopId, 'members.manage');
    await removeMember(orm.em, params.workshopId, params.userId);
    res.status(204).end();
  });

  return router;
}
