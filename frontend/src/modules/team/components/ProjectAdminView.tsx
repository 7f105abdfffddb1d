import { Callout, H2, Section, SectionCard, Tab, Tabs, Tag, type TabId } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ProjectTeamQuery } from '@/gql/graphql';
import { AuditTrailPanel } from '@/modules/audit/components/AuditTrailPanel';
import { allows, ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { ExchangePanel } from '@/modules/exchange/components/ExchangePanel';
import { ReleasesPanel } from '@/modules/releases/components/ReleasesPanel';
import { InvitationsPanel } from './InvitationsPanel';
import { MembersPanel } from './MembersPanel';

/** Tabs of the admin page, kept in the `tab` search parameter so each can be linked to. */
export type AdminTab = 'members' | 'releases' | 'audit' | 'exchange';
export const ADMIN_TABS: readonly AdminTab[] = ['members', 'releases', 'audit', 'exchange'];

export type ProjectAdminViewProps = {
  project: ProjectTeamQuery['project'];
  tab: AdminTab;
  onTabChange: (tab: AdminTab) => void;
};

/**
 * The project's records and team: members and invitations, releases, the audit trail and the
 * exchange files. Admins change them; everyone else reads what their role may read.
 */
export function ProjectAdminView({ project, tab, onTabChange }: ProjectAdminViewProps) {
  const canManage = allows(project, 'MEMBERS_MANAGE');
  const canRelease = allows(project, 'RELEASE_CREATE');
  const people = project.members.map((member) => member.user);
  const handleTabChange = (next: TabId) => onTabChange(next as AdminTab);

  const membersPanel = (
    <>
      <Section title="Members" compact icon={IconNames.PEOPLE}>
        <SectionCard>
          <MembersPanel projectId={project.id} members={project.members} canManage={canManage} />
        </SectionCard>
      </Section>
      {canManage && (
        <Section title="Invitations" compact icon={IconNames.ENVELOPE} className="sc-section">
          <SectionCard>
            <InvitationsPanel projectId={project.id} invitations={project.invitations} />
          </SectionCard>
        </Section>
      )}
    </>
  );

  return (
    <div className="sc-page">
      <header className="sc-page-header">
        <div>
          <H2 className="sc-page-title">Team and records</H2>
          <div className="sc-tag-row">
            <Tag minimal className="sc-role-tag">
              Your role: {ROLE_LABELS[project.myRole]}
            </Tag>
            {!canManage && (
              <Tag minimal icon={IconNames.EYE_OPEN}>
                Read only
              </Tag>
            )}
          </div>
        </div>
      </header>
      {!canManage && tab === 'members' && (
        <Callout icon={IconNames.INFO_SIGN} className="sc-form-callout">
          A project admin invites people and sets roles; here you can see who works on the project.
        </Callout>
      )}
      <Tabs id="admin-tabs" selectedTabId={tab} onChange={handleTabChange} renderActiveTabPanelOnly large className="sc-tabs">
        <Tab id="members" icon={IconNames.PEOPLE} title="Members" tagContent={project.members.length} tagProps={{ minimal: true, round: true }} panel={membersPanel} />
        <Tab id="releases" icon={IconNames.ARCHIVE} title="Releases" panel={<ReleasesPanel projectId={project.id} canCreate={canRelease} />} />
        <Tab id="audit" icon={IconNames.HISTORY} title="Audit trail" panel={<AuditTrailPanel projectId={project.id} people={people} />} />
        <Tab id="exchange" icon={IconNames.EXCHANGE} title="Export and import" panel={<ExchangePanel projectId={project.id} />} />
      </Tabs>
    </div>
  );
}
