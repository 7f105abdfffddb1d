import { useParams } from 'react-router-dom';
import { AgeModelView } from '@/modules/age-model/components/AgeModelView';

/** /projects/:projectId/sites/:siteId/age-model */
export function AgeModelPage() {
  const { projectId = '', siteId = '' } = useParams();
  return <AgeModelView projectId={projectId} siteId={siteId} />;
}
