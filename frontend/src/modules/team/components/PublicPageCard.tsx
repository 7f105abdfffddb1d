import { Card, Classes, Elevation, H1 } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/app/paths';
import './team.css';

export type PublicPageCardProps = { title: string; lead: ReactNode; children: ReactNode };

/** The frame of the pages reached from an e-mail link, in the sign-in page's look. */
export function PublicPageCard({ title, lead, children }: PublicPageCardProps) {
  return (
    <div className="sc-signin-page">
      <Card elevation={Elevation.ONE} className="sc-signin-card">
        <H1 className="sc-signin-title">{title}</H1>
        <p className={`${Classes.TEXT_MUTED} sc-signin-tagline`}>{lead}</p>
        {children}
        <p className={`${Classes.TEXT_SMALL} sc-public-footer`}>
          <Link to={paths.signIn()}>Back to sign-in</Link>
        </p>
      </Card>
    </div>
  );
}
