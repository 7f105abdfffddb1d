import { Alignment, Classes, Icon, Navbar, NavbarDivider, NavbarGroup, NavbarHeading } from '@blueprintjs/core';
import { IconNames, type IconName } from '@blueprintjs/icons';
import { Suspense } from 'react';
import { NavLink, Outlet, useParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { AgeScaleSwitch } from '@/modules/ages/components/AgeScaleSwitch';
import { RequireSession } from '@/modules/auth/components/RequireSession';
import { useSession } from '@/modules/auth/hooks/useSession';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { ProjectSwitcher } from './ProjectSwitcher';
import { UserMenu } from './UserMenu';

/** The mark beside the product name: a small column with an event contact. */
function StratochronMark() {
  return (
    <svg width={18} height={18} viewBox="0 0 16 16" aria-hidden className="sc-mark">
      <rect x={2} y={1} width={12} height={3} fill="#c9a25e" />
      <rect x={2} y={4} width={12} height={4} fill="#8a8478" />
      <rect x={2} y={8.6} width={12} height={3} fill="#5d4630" />
      <rect x={2} y={11.6} width={12} height={3.4} fill="#b8aa92" />
      <path d="M1 8.3 H15" stroke="#8b3a2a" strokeWidth={1.2} />
    </svg>
  );
}

/** A link in the navbar styled as a minimal button, marked when its route is active. */
function NavbarLink({ to, icon, text }: { to: string; icon: IconName; text: string }) {
  return (
    <NavLink
      to={to}
      end
      className={({ isActive }) => [Classes.BUTTON, Classes.MINIMAL, 'sc-nav-link', isActive ? Classes.ACTIVE : ''].join(' ')}
    >
      <Icon icon={icon} />
      <span className={Classes.BUTTON_TEXT}>{text}</span>
    </NavLink>
  );
}

/** The signed-in frame: a quiet navbar (product, project switcher, tools, age scale, user) over the page. */
export function AppShell() {
  const session = useSession();
  const { projectId } = useParams();
  return (
    <RequireSession>
      <div className="sc-shell">
        <Navbar className="sc-navbar">
          <NavbarGroup align={Alignment.START}>
            <NavbarHeading className="sc-brand">
              <StratochronMark />
              Stratochron
            </NavbarHeading>
            <NavbarDivider />
            <ProjectSwitcher currentProjectId={projectId} />
            {projectId && <NavbarLink to={paths.ladder(projectId)} icon={IconNames.TIMELINE_EVENTS} text="Ladder" />}
            {projectId && <NavbarLink to={paths.recurrence(projectId)} icon={IconNames.TIMELINE_LINE_CHART} text="Recurrence" />}
            {projectId && <NavbarLink to={paths.projectAdmin(projectId)} icon={IconNames.PEOPLE} text="Team and records" />}
            <NavbarLink to={paths.calibrate()} icon={IconNames.TIMELINE_AREA_CHART} text="Calibrate" />
          </NavbarGroup>
          <NavbarGroup align={Alignment.END}>
            <AgeScaleSwitch />
            <NavbarDivider />
            {session && <UserMenu user={session.user} />}
          </NavbarGroup>
        </Navbar>
        <main className="sc-main">
          <Suspense fallback={<LoadingState />}>
            <Outlet />
          </Suspense>
        </main>
      </div>
    </RequireSession>
  );
}
