import { Router, type Request } from 'express';
import type { AppContext } from '../context';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import * as teams from '../services/teams';
import { auditLog } from '../services/audit';
import { idParamSchema, inviteBodySchema, memberChangeBodySchema, teamBodySchema, type Role } from '../../shared/schemas';

const OWNER: readonly Role[] = ['owner'];

function access(req: Request, allowed?: readonly Role[]): Promise<teams.TeamAccess> {
  const teamId = parseInput(idParamSchema, req.params.teamId, 'path');
  return teams.teamAccess(teamId, currentUser(req), allowed);
}

export function teamRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json({ teams: await teams.listTeams(currentUser(req)) });
  });

  router.post('/', async (req, res) => {
    const { name } = parseInput(teamBodySchema, req.body, 'body');
    res.status(201).json({ team: await teams.createTeam(ctx, currentUser(req), name) });
  });

  router.get('/:teamId', async (req, res) => {
    res.json(await teams.teamDetail(await access(req)));
  });

  router.patch('/:teamId', async (req, res) => {
    const team = await access(req, OWNER);
    const { name } = parseInput(teamBodySchema, req.body, 'body');
    res.json({ team: await teams.renameTeam(team, currentUser(req), name) });
  });

  router.get('/:teamId/audit', async (req, res) => {
    res.json({ events: await auditLog(await access(req, OWNER)) });
  });

  router.post('/:teamId/invitations', async (req, res) => {
    const team = await access(req, OWNER);
    const body = parseInput(inviteBodySchema, req.body, 'body');
    res.status(201).json({ invitation: await teams.invite(ctx, team, currentUser(req), body) });
  });

  router.delete('/:teamId/invitations/:invitationId', async (req, res) => {
    const team = await access(req, OWNER);
    await teams.cancelInvitation(team, currentUser(req), parseInput(idParamSchema, req.params.invitationId, 'path'));
    res.status(204).end();
  });

  router.patch('/:teamId/members/:userId', async (req, res) => {
    const team = await access(req);
    const userId = parseInput(idParamSchema, req.params.userId, 'path');
    const body = parseInput(memberChangeBodySchema, req.body, 'body');
    res.json({ member: await teams.changeMember(ctx, team, currentUser(req), userId, body) });
  });

  router.delete('/:teamId/members/:userId', async (req, res) => {
    const team = await access(req);
    await teams.removeMember(ctx, team, currentUser(req), parseInput(idParamSchema, req.params.userId, 'path'));
    res.status(204).end();
  });

  return router;
}
