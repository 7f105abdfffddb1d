import { useParams } from 'react-router-dom';
import { RecurrenceView } from '@/modules/recurrence/components/RecurrenceView';

/** /projects/:projectId/recurrence */
export function RecurrencePage() {
  const { projectId = '' } = useParams();
  return <RecurrenceView projectId={projectId} />;
}
