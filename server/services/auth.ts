import { Op, QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { Brewery, Invite, Session, User } from '../models';
import { badRequest, conflict, HttpError, notFound, unauthenticated, wrongPassword } from '../errors';
import { assertStrongPassword, checkPassword, hashPassword, standInHash } from './passwords';
import { hashToken, newToken } from './tokens';
import { addStarterIngredients } from './ingredients';
import type { Logger } from 'pino';
import { publicLink, sendMail, sendMailInBackground } from './mail';
import type {
  AcceptInviteInput,
  ChangePasswordInput,
  Me,
  SignUpInput,
  BrewerySettingsInput,
  InviteInput,
  UpdateMemberInput,
} from '../../shared/schemas/auth';
import { ROLE_LABELS } from '../../shared/schemas/roles';
import type { Team } from '../../shared/contract/auth';

const INVITE_HOURS = 72;
const RESET_HOURS = 2;

/** The person behind a session, with their brewery: the columns one signed-in request reads. */
export const SESSION_USER_COLUMNS = `u.id AS userId, u.brewery_id AS breweryId, u.role, u.email, u.display_name AS displayName,
  u.disabled_at AS disabledAt, b.name AS breweryName, b.unit_system AS unitSystem, b.time_zone AS timeZone`;

export interface SessionUserRow {
  userId: number | null;
  breweryId: number | null;
  role: Express.User['role'] | null;
  email: string | null;
  displayName: string | null;
  disabledAt: Date | null;
  breweryName: string | null;
  unitSystem: Express.User['brewery']['unitSystem'] | null;
  timeZone: string | null;
}

/** A row of SESSION_USER_COLUMNS as the signed-in person; a disabled or vanished account has no session. */
export function toSessionUser(row: SessionUserRow | undefined): Express.User | false {
  if (!row || row.userId === null || row.disabledAt !== null || row.breweryName === null) return false;
  return {
    id: row.userId,
    breweryId: row.breweryId!,
    role: row.role!,
    email: row.email!,
    displayName: row.displayName!,
    brewery: { id: row.breweryId!, name: row.breweryName, unitSystem: row.unitSystem!, timeZone: row.timeZone! },
  };
}

/** Loads the person with this id and their brewery in one statement. */
export async function sessionUser(id: number): Promise<Express.User | false> {
  const [row] = await sequelize.query<SessionUserRow>(
    `SELECT ${SESSION_USER_COLUMNS} FROM users u JOIN breweries b ON b.id = u.brewery_id WHERE u.id = ?`,
    { type: QueryTypes.SELECT, replacements: [id] },
  );
  return toSessionUser(row);
}

/** Checks e-mail and password; answers the same way whether the e-mail is unknown or the password wrong. */
export async function verifyCredentials(email: string, password: string): Promise<User | null> {
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  // Compare against a stand-in hash when the account is unknown so timing does not reveal it.
  const ok = await checkPassword(password, user?.passwordHash ?? (await standInHash()));
  if (!user || !ok || user.disabledAt) return null;
  return user;
}

/** What the client knows of the signed-in person: the session's user and brewery, both loaded this request. */
export function me(user: Express.User): Me {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role, brewery: user.brewery };
}

/** A new brewery, with the starter ingredient library every brewery begins with. */
export async function createBrewery(
  fields: { name: string; unitSystem: Brewery['unitSystem']; timeZone: string },
  transaction?: Transaction,
): Promise<Brewery> {
  const brewery = await Brewery.create(fields, { transaction });
  await addStarterIngredients(brewery.id, transaction);
  return brewery;
}

/** Sign-up creates a brewery and its head brewer. */
export async function signUp(input: SignUpInput): Promise<User> {
  assertStrongPassword(input.password, [input.email, input.displayName, input.breweryName]);
  if (await User.findOne({ where: { email: input.email } })) {
    throw badRequest('This e-mail already has an account', {
      email: 'This e-mail already has an account: sign in instead',
    });
  }
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const brewery = await createBrewery(
      { name: input.breweryName, unitSystem: input.unitSystem, timeZone: input.timeZone },
      transaction,
    );
    return User.create(
      {
        breweryId: brewery.id,
        email: input.email,
        displayName: input.displayName,
        role: 'head_brewer',
        passwordHash,
        disabledAt: null,
      },
      { transaction },
    );
  });
}

/** Ends every session of a person except, optionally, the one making the request. */
export async function endSessions(userId: number, exceptSid?: string, transaction?: Transaction): Promise<void> {
  await Session.destroy({ where: { userId, ...(exceptSid ? { sid: { [Op.ne]: exceptSid } } : {}) }, transaction });
}

export async function changePassword(userId: number, input: ChangePasswordInput, currentSid: string): Promise<void> {
  const user = await User.findByPk(userId);
  if (!user) throw unauthenticated();
  if (!(await checkPassword(input.currentPassword, user.passwordHash))) {
    throw wrongPassword(400, 'Your current password is not right', {
      currentPassword: 'This is not your current password',
    });
  }
  assertStrongPassword(input.newPassword, [user.email, user.displayName], 'newPassword');
  user.passwordHash = await hashPassword(input.newPassword);
  await user.save();
  await endSessions(user.id, currentSid);
}

async function issueLink(
  purpose: 'invite' | 'reset',
  fields: { breweryId: number; email: string; role: Invite['role']; createdById: number | null },
): Promise<string> {
  const { token, hash } = newToken();
  const hours = purpose === 'invite' ? INVITE_HOURS : RESET_HOURS;
  await Invite.create({
    ...fields,
    purpose,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + hours * 3_600_000),
    usedAt: null,
  });
  return token;
}

/** The head brewer invites a teammate by e-mail with a role. */
export async function inviteTeammate(
  inviter: Express.User,
  input: InviteInput,
): Promise<{ id: number; email: string }> {
  if (await User.findOne({ where: { email: input.email } })) {
    throw conflict('This e-mail already has a Kettlewright account');
  }
  const brewery = await Brewery.findByPk(inviter.breweryId);
  if (!brewery) throw notFound('Brewery');
  const token = await issueLink('invite', {
    breweryId: inviter.breweryId,
    email: input.email,
    role: input.role,
    createdById: inviter.id,
  });
  const link = publicLink(`/join/${token}`);
  await sendMail({
    to: input.email,
    subject: `${inviter.displayName} invited you to ${brewery.name} on Kettlewright`,
    text: [
      `${inviter.displayName} has invited you to join ${brewery.name} on Kettlewright as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      '',
      `Set your password here (the link works for ${INVITE_HOURS} hours, once):`,
      link,
      '',
      'If you did not expect this, ignore this message.',
    ].join('\n'),
  });
  const invite = await Invite.findOne({ where: { tokenHash: hashToken(token) } });
  return { id: invite!.id, email: input.email };
}

async function openLink(token: string, purpose: 'invite' | 'reset'): Promise<Invite> {
  const invite = await Invite.findOne({ where: { tokenHash: hashToken(token), purpose } });
  if (!invite || invite.usedAt || invite.expiresAt.getTime() < Date.now()) throw linkGone(purpose);
  return invite;
}

/** A link that was used, has expired or never existed: the person can only ask for a new one. */
const linkGone = (purpose: 'invite' | 'reset') =>
  new HttpError(
    'not_found',
    purpose === 'invite'
      ? 'This invitation has been used or has expired. Ask your head brewer for a new one.'
      : 'This reset link has been used or has expired. Ask for a new one from the sign-in page.',
  );

/** Whether a reset link can still be used, so its page can say so before a new password is typed. */
export async function checkResetLink(token: string): Promise<void> {
  await openLink(token, 'reset');
}

export async function describeInvite(token: string): Promise<{ email: string; breweryName: string; role: string }> {
  const invite = await openLink(token, 'invite');
  const brewery = await Brewery.findByPk(invite.breweryId);
  return { email: invite.email, breweryName: brewery?.name ?? '', role: invite.role ?? '' };
}

export async function acceptInvite(token: string, input: AcceptInviteInput): Promise<User> {
  const invite = await openLink(token, 'invite');
  assertStrongPassword(input.password, [invite.email, input.displayName]);
  if (await User.findOne({ where: { email: invite.email } })) throw conflict('This e-mail already has an account');
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const [used] = await Invite.update({ usedAt: new Date() }, { where: { id: invite.id, usedAt: null }, transaction });
    if (used !== 1) throw linkGone('invite');
    return User.create(
      {
        breweryId: invite.breweryId,
        email: invite.email,
        displayName: input.displayName,
        role: invite.role ?? 'assistant_brewer',
        passwordHash,
        disabledAt: null,
      },
      { transaction },
    );
  });
}

/**
 * Sends a reset link if the account exists; the caller answers the same either way. The link is stored
 * before this returns, but the mail goes out in the background (failures go to `log`), so waiting on
 * the mail server does not make a known address answer slower than an unknown one.
 */
export async function requestPasswordReset(email: string, log: Logger): Promise<User | null> {
  const user = await User.findOne({ where: { email } });
  if (!user || user.disabledAt) return null;
  const token = await issueLink('reset', { breweryId: user.breweryId, email, role: null, createdById: null });
  sendMailInBackground(
    {
      to: email,
      subject: 'Reset your Kettlewright password',
      text: [
        'Someone asked to reset the password of your Kettlewright account.',
        '',
        `Choose a new password here (the link works for ${RESET_HOURS} hours, once):`,
        publicLink(`/reset/${token}`),
        '',
        'If it was not you, ignore this message: your password stays as it is.',
      ].join('\n'),
    },
    log,
  );
  return user;
}

export async function resetPassword(token: string, password: string): Promise<User> {
  const link = await openLink(token, 'reset');
  const user = await User.findOne({ where: { email: link.email } });
  if (!user) throw linkGone('reset');
  assertStrongPassword(password, [user.email, user.displayName]);
  user.passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const [used] = await Invite.update({ usedAt: new Date() }, { where: { id: link.id, usedAt: null }, transaction });
    if (used !== 1) throw linkGone('reset');
    await user.save({ transaction });
  });
  await endSessions(user.id);
  return user;
}

export async function teamMembers(breweryId: number): Promise<Team> {
  const [users, invites] = await Promise.all([
    User.findAll({ where: { breweryId }, order: [['displayName', 'ASC']] }),
    Invite.findAll({
      where: { breweryId, purpose: 'invite', usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      order: [['createdAt', 'DESC']],
    }),
  ]);
  return {
    members: users.map((u) => ({
      id: u.id,
      email: u.email,
      displayName: u.displayName,
      role: u.role,
      disabled: Boolean(u.disabledAt),
    })),
    // Only reset links have no role; these are invites.
    pendingInvites: invites.flatMap((i) =>
      i.role ? [{ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString() }] : [],
    ),
  };
}

export async function updateMember(
  head: Express.User,
  userId: number,
  input: UpdateMemberInput,
  transaction?: Transaction,
): Promise<User> {
  const user = await User.findOne({ where: { id: userId, breweryId: head.breweryId }, transaction });
  if (!user) throw notFound('Teammate');
  if (user.id === head.id) throw conflict('You cannot change your own role or access; ask another head brewer');
  if (input.role) user.role = input.role;
  if (input.disabled !== undefined) user.disabledAt = input.disabled ? new Date() : null;
  await user.save({ transaction });
  if (input.disabled || input.role) await endSessions(user.id, undefined, transaction);
  return user;
}

export async function updateBrewery(
  breweryId: number,
  input: BrewerySettingsInput,
  transaction?: Transaction,
): Promise<Brewery> {
  const brewery = await Brewery.findByPk(breweryId, { transaction });
  if (!brewery) throw notFound('Brewery');
  return brewery.update(input, { transaction });
}
