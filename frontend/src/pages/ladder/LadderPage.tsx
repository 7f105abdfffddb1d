import { useParams } from 'react-router-dom';
import { LadderView } from '@/modules/correlation/components/LadderView';

/** /projects/:projectId/ladder */
export function LadderPage() {
  const { projectId = '' } = useParams();
  return <LadderView projectId={projectId} />;
}
