import { Button, Callout, Classes, Dialog, DialogBody, DialogFooter, H5, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { releaseQueries } from '@/modules/releases/hooks/releaseQueries';
import { LoadingState } from '@/modules/ui/components/LoadingState';

export type ReleaseDialogProps = {
  projectId: string;
  releaseId: string | null;
  onClose: () => void;
};

/** One frozen release, read only: its note, author, segments and sites (with their column and sample counts) as they were. */
export function ReleaseDialog({ projectId, releaseId, onClose }: ReleaseDialogProps) {
  const release = useQuery({ ...releaseQueries.detail(projectId, releaseId ?? ''), enabled: releaseId !== null });
  const data = release.data;
  return (
    <Dialog isOpen={releaseId !== null} onClose={onClose} title={data ? `Release ${data.number}` : 'Release'} icon={IconNames.ARCHIVE} style={{ width: 940, maxWidth: '95vw' }}>
      <DialogBody>
        {release.error ? (
          <Callout intent={Intent.DANGER}>{formErrorOf(release.error, [])}</Callout>
        ) : !data ? (
          <LoadingState />
        ) : (
          <>
            <p>
              <Tag minimal icon={IconNames.LOCK}>
                read only
              </Tag>{' '}
              “{data.note}” — frozen <span className="num">{new Date(data.createdAt).toLocaleString()}</span> by {data.createdBy.displayName}
            </p>
            <H5>Segments ({data.segments.length})</H5>
            <HTMLTable compact striped className="sc-table sc-table-fill">
              <thead>
                <tr>
                  <th>Name</th>
                  <th className="sc-numeric">From km</th>
                  <th className="sc-numeric">To km</th>
                </tr>
              </thead>
              <tbody>
                {data.segments.map((segment) => (
                  <tr key={segment.id}>
                    <td>{segment.name}</td>
                    <td className="num sc-numeric">{segment.startKm}</td>
                    <td className="num sc-numeric">{segment.endKm}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
            <H5 className="sc-section">Sites ({data.sites.length})</H5>
            <HTMLTable compact striped className="sc-table sc-table-fill">
              <thead>
                <tr>
                  <th>Name</th>
                  <th>Kind</th>
                  <th>Segment</th>
                  <th className="sc-numeric">Along strike km</th>
                  <th className="sc-numeric">Lat, lon</th>
                  <th className="sc-numeric">Units</th>
                  <th className="sc-numeric">Events</th>
                  <th className="sc-numeric">Samples</th>
                </tr>
              </thead>
              <tbody>
                {data.sites.map((site) => (
                  <tr key={site.id}>
                    <td>{site.name}</td>
                    <td>{site.kind.toLowerCase()}</td>
                    <td>{site.segment?.name ?? <span className={Classes.TEXT_MUTED}>none</span>}</td>
                    <td className="num sc-numeric">{site.alongStrikeKm}</td>
                    <td className="num sc-numeric">
                      {site.latitude.toFixed(4)}, {site.longitude.toFixed(4)}
                    </td>
                    <td className="num sc-numeric">{site.units.length}</td>
                    <td className="num sc-numeric">{site.eventHorizons.length}</td>
                    <td className="num sc-numeric">{site.samples.length}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          </>
        )}
      </DialogBody>
      <DialogFooter actions={<Button text="Close" onClick={onClose} />} />
    </Dialog>
  );
}
