import { Breadcrumbs, Classes, type BreadcrumbProps } from '@blueprintjs/core';
import { Link } from 'react-router-dom';

export type PageCrumb = { text: string; to?: string };

export type PageBreadcrumbsProps = { crumbs: readonly PageCrumb[] };

/** Where the page sits (projects / project / site), each step a client-side link. */
export function PageBreadcrumbs({ crumbs }: PageBreadcrumbsProps) {
  const items: BreadcrumbProps[] = crumbs.map((crumb) => ({ text: crumb.text, href: crumb.to }));
  const renderBreadcrumb = ({ text, href }: BreadcrumbProps) =>
    href ? (
      <Link to={href} className={Classes.BREADCRUMB}>
        {text}
      </Link>
    ) : (
      <span className={Classes.BREADCRUMB}>{text}</span>
    );
  const renderCurrent = ({ text }: BreadcrumbProps) => <span className={`${Classes.BREADCRUMB} ${Classes.BREADCRUMB_CURRENT}`}>{text}</span>;
  return <Breadcrumbs className="sc-breadcrumbs" items={items} breadcrumbRenderer={renderBreadcrumb} currentBreadcrumbRenderer={renderCurrent} />;
}
