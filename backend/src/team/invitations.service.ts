import { Inject, Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission, roleAllows } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { AuthPayload, AuthService } from '../auth/auth.service';
import { normaliseEmail, requirePasswordLength } from '../auth/account-rules';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { badInput, notFound } from '../common/errors/domain-error';
import { hashToken, INVITATION_LIFETIME_MS, issueToken, TokenRefusal, tokenRefusal } from '../common/one-time-token';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DatabaseService } from '../database/database.service';
import { invitationMail } from '../mail/mail-templates';
import { MailService } from '../mail/mail.service';
import { MembershipsRepository } from './memberships.repository';
import { ProjectsRepository } from '../projects/projects.repository';
import { UsersRepository } from '../users/users.repository';
import { AcceptInvitationInput, InviteMemberInput } from './dto/invitation.inputs';
import { InvitationRow, InvitationsRepository } from './invitations.repository';

const REFUSALS: Record<TokenRefusal | 'unknown', string> = {
  unknown: 'this invitation link is not valid; check it was copied whole',
  used: 'this invitation was already accepted; sign in instead',
  expired: 'this invitation has expired; ask a project admin for a new one',
};

/** What the audit trail keeps of an invitation: never the token hash. */
function auditImage(invitation: InvitationRow) {
  return { email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt, acceptedAt: invitation.acceptedAt };
}

@Injectable()
export class InvitationsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly invitations: InvitationsRepository,
    private readonly memberships: MembershipsRepository,
    private readonly projects: ProjectsRepository,
    private readonly users: UsersRepository,
    private readonly access: AccessService,
    private readonly audit: AuditService,
    private readonly auth: AuthService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * Invite an address to the project with a role (ADMIN only) and e-mail the link. The mail is
   * sent inside the transaction: if it cannot be sent, no invitation is left behind.
   */
  async invite(user: AuthUser, input: InviteMemberInput): Promise<InvitationRow> {
    await this.access.requireAccess({ user, permission: Permission.MembersManage, projectId: input.projectId });
    const email = normaliseEmail(input.email);
    const project = await this.projects.findById(input.projectId);
    if (!project) throw notFound('project');
    const existing = await this.users.findByEmail(email);
    if (existing && (await this.memberships.find(project.id, existing.id))) {
      throw badInput('email', `${email} is already a member of this project; change their role instead`);
    }
    const inviter = await this.users.findById(user.id);
    const now = new Date();
    const issued = issueToken(INVITATION_LIFETIME_MS, now);
    return this.database.transaction(async (tx) => {
      await this.invitations.expirePending(project.id, email, now, tx);
      const invitation = await this.invitations.insert(
        { projectId: project.id, email, role: input.role, tokenHash: issued.tokenHash, invitedById: user.id, expiresAt: issued.expiresAt },
        tx,
      );
      await this.audit.record(tx, {
        actor: user, projectId: project.id, action: 'invite', objectType: 'invitation', objectId: invitation.id, after: auditImage(invitation),
      });
      const link = `${this.config.publicUrl}/accept-invitation?token=${encodeURIComponent(issued.token)}`;
      await this.mail.send(
        email,
        invitationMail({ projectName: project.name, role: input.role, inviterName: inviter?.displayName ?? user.email, link, expiresAt: issued.expiresAt }),
      );
      return invitation;
    });
  }

  /**
   * Redeem an invitation (no sign-in needed: the token is the proof). A new address gets an
   * account with the given password; an existing account must give its own password, so a
   * forwarded link cannot attach someone else's account.
   */
  /**
   * What an invitation link can still do, for the page that opens it: a used link says so
   * instead of showing a form that can only fail. The project is named for a known token only.
   */
  async linkState(token: string): Promise<{ status: 'OPEN' | 'USED' | 'EXPIRED' | 'UNKNOWN'; projectName: string | null }> {
    // Issued tokens are short; a long string names none and is not hashed.
    const invitation = token.trim() === '' || token.length > 256 ? undefined : await this.invitations.findByTokenHash(hashToken(token.trim()));
    if (!invitation) return { status: 'UNKNOWN', projectName: null };
    const project = await this.projects.findById(invitation.projectId);
    const refusal = tokenRefusal({ expiresAt: invitation.expiresAt, usedAt: invitation.acceptedAt });
    const status = refusal === 'used' ? 'USED' : refusal === 'expired' ? 'EXPIRED' : 'OPEN';
    return { status, projectName: project?.name ?? null };
  }

  acceptInvitation(input: AcceptInvitationInput): Promise<AuthPayload> {
    return this.database.transaction(async (tx) => {
      const now = new Date();
      const invitation = await this.invitations.findByTokenHashForUpdate(hashToken(input.token.trim()), tx);
      if (!invitation) throw badInput('token', REFUSALS.unknown);
      const refusal = tokenRefusal({ expiresAt: invitation.expiresAt, usedAt: invitation.acceptedAt }, now);
      if (refusal) throw badInput('token', REFUSALS[refusal]);

      let account = await this.users.findByEmail(invitation.email, tx);
      const newAccount = !account;
      if (!account) {
        requirePasswordLength(input.password);
        account = await this.users.insert(
          {
            email: invitation.email,
            displayName: input.displayName?.trim() || invitation.email.split('@')[0],
            passwordHash: await hashPassword(input.password),
          },
          tx,
        );
      } else if (!account.passwordHash) {
        requirePasswordLength(input.password);
        await this.users.setPasswordHash(account.id, await hashPassword(input.password), tx);
      } else if (!(await verifyPassword(input.password, account.passwordHash))) {
        throw badInput('password', `${invitation.email} already has an account: enter its password to join`);
      }

      if (!(await this.invitations.markAccepted(invitation.id, now, tx))) throw badInput('token', REFUSALS.used);
      const actor = { id: account.id, email: account.email };
      // Someone who became a member meanwhile keeps their role: accepting never demotes.
      const membership = await this.memberships.find(invitation.projectId, account.id, tx);
      if (!membership) await this.memberships.upsert(invitation.projectId, account.id, invitation.role, tx);
      await this.audit.record(tx, {
        actor,
        projectId: invitation.projectId,
        action: 'accept',
        objectType: 'invitation',
        objectId: invitation.id,
        before: auditImage(invitation),
        after: { ...auditImage({ ...invitation, acceptedAt: now }), userId: account.id, newAccount, role: membership?.role ?? invitation.role },
      });
      return this.auth.issue(account);
    });
  }

  /** The project's invitations, newest first: for those who manage members, otherwise none. */
  async listForProject(user: AuthUser, projectId: string): Promise<InvitationRow[]> {
    const role = await this.access.roleOf(user, projectId);
    if (!role || !roleAllows(role, Permission.MembersManage)) return [];
    return this.invitations.listForProject(projectId);
  }
}
