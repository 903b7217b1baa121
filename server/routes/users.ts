import { Router } from 'express';
import { UserInviteSchema, UserUpdateSchema } from '@shared/schemas/user.ts';
import { ConflictError } from '../errors.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import { User } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentUser } from '../presenters/user.ts';
import { resendInvitation, inviteUser, updateUser } from '../services/users/index.ts';
import { loadUser } from './load.ts';

export const usersRouter = Router();
usersRouter.use(requireUser);

usersRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'user', 'list');
  const users = await User.findAll({ order: [['name', 'ASC']] });
  res.json({ data: users.map((u) => presentUser(u, viewer)) });
});

usersRouter.post('/', validate(UserInviteSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'user', 'invite');
  const user = await inviteUser(req.body, viewer, req.ip);
  res.status(201).json({ data: presentUser(user, viewer) });
});

usersRouter.patch('/:id', validate(UserUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const target = await loadUser(req.params.id);
  authorize(viewer, 'user', 'update', target);
  const updated = await updateUser(target, req.body, viewer, req.ip);
  res.json({ data: presentUser(updated, viewer) });
});

usersRouter.post('/:id/invitation', async (req, res) => {
  const viewer = currentUser(req);
  const target = await loadUser(req.params.id);
  authorize(viewer, 'user', 'update', target);
  if (target.passwordHash) throw ConflictError('This person has already accepted their invitation.', 'already_accepted');
  await resendInvitation(target, viewer);
  res.status(202).json({ data: { message: `A new invitation has been sent to ${target.email}.` } });
});
