import { Button, Callout, FileInput, FormGroup, HTMLSelect, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type ChangeEvent } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useAttachmentMutations } from '@/modules/attachments/hooks/attachmentQueries';
import { ACCEPTED_FILE_TYPES, uploadProblem, type AttachmentOwner } from '@/modules/attachments/utils/attachmentFiles';

export type UploadTarget = { key: string; label: string; owner: AttachmentOwner };

export type AttachmentUploadFormProps = {
  projectId: string;
  siteId: string;
  /** What a file can be attached to: the site first, then its samples. */
  targets: readonly UploadTarget[];
};

/** Choose a file and what it belongs to, and send it; the server's refusal (type, size) is shown as it says it. */
export function AttachmentUploadForm({ projectId, siteId, targets }: AttachmentUploadFormProps) {
  const { upload } = useAttachmentMutations(projectId, siteId);
  const [file, setFile] = useState<File | null>(null);
  const [targetKey, setTargetKey] = useState(targets[0]?.key ?? '');
  const [problem, setProblem] = useState<string | null>(null);
  const [inputKey, setInputKey] = useState(0);
  const target = targets.find((candidate) => candidate.key === targetKey) ?? targets[0];

  const handleFile = (event: ChangeEvent<HTMLInputElement>) => {
    upload.reset();
    const chosen = event.target.files?.[0] ?? null;
    setFile(chosen);
    setProblem(chosen ? uploadProblem(chosen) : null);
  };
  const handleUpload = () => {
    if (!file || !target || problem) return;
    upload.mutate(
      { owner: target.owner, file },
      {
        onSuccess: () => {
          setFile(null);
          // A new key gives a fresh file input, so the same file can be chosen again.
          setInputKey((key) => key + 1);
        },
      },
    );
  };

  const serverError = formErrorOf(upload.error, []);
  return (
    <div>
      <div className="sc-file-upload">
        <FormGroup label="File" labelFor="attachment-file" helperText="PNG, JPEG, PDF, CSV or plain text; at most 20 MB." className="sc-file-upload-input">
          <FileInput
            key={inputKey}
            inputProps={{ id: 'attachment-file', accept: ACCEPTED_FILE_TYPES }}
            text={file ? file.name : 'Choose a file…'}
            hasSelection={file !== null}
            onInputChange={handleFile}
            fill
          />
        </FormGroup>
        <FormGroup label="Attach to" labelFor="attachment-target">
          <HTMLSelect id="attachment-target" value={target?.key ?? ''} onChange={(event) => setTargetKey(event.target.value)}>
            {targets.map((candidate) => (
              <option key={candidate.key} value={candidate.key}>
                {candidate.label}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <Button icon={IconNames.UPLOAD} text="Upload" intent={Intent.PRIMARY} disabled={!file || problem !== null} loading={upload.isPending} onClick={handleUpload} />
      </div>
      {(problem ?? serverError) && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout" title="Not uploaded">
          {problem ? `${problem.charAt(0).toUpperCase()}${problem.slice(1)}.` : serverError}
        </Callout>
      )}
    </div>
  );
}
