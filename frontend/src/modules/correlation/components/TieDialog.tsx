import { Checkbox, FormGroup } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { SelectField, TextAreaField } from '@/modules/ui/components/FormFields';

/** The kinds of evidence a correlator cites for a tie (SPEC: age overlap, order, log match, count between). */
export const TIE_EVIDENCE = ['age overlap', 'stratigraphic order', 'log match', 'event count between'] as const;

const CONFIDENCE_OPTIONS = [
  { value: '1', label: '1 · certain' },
  { value: '2', label: '2 · probable' },
  { value: '3', label: '3 · likely' },
  { value: '4', label: '4 · possible' },
] as const;

type Confidence = (typeof CONFIDENCE_OPTIONS)[number]['value'];

export type TieValues = { confidence: number; evidence: string[]; note: string | null };

export type TieDialogProps = {
  isOpen: boolean;
  /** "E3 at Core A – E2 at Marsh B" */
  description: string;
  submitting: boolean;
  error: unknown;
  onClose: () => void;
  onSubmit: (values: TieValues) => void;
};

/** Tie two selected events: confidence rank, evidence and a note. */
export function TieDialog({ isOpen, description, submitting, error, onClose, onSubmit }: TieDialogProps) {
  const [confidence, setConfidence] = useState<Confidence>('2');
  const [evidence, setEvidence] = useState<string[]>(['age overlap']);
  const [note, setNote] = useState('');
  const toggle = (tag: string) => () => setEvidence((previous) => (previous.includes(tag) ? previous.filter((entry) => entry !== tag) : [...previous, tag]));
  const handleSubmit = () => onSubmit({ confidence: Number(confidence), evidence, note: note.trim() === '' ? null : note.trim() });
  return (
    <FormDialog
      title="Tie events"
      icon={IconNames.LINK}
      isOpen={isOpen}
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={submitting}
      submitLabel="Tie"
      formError={formErrorOf(error, [])}
    >
      <p>{description}</p>
      <SelectField name="confidence" label="Confidence" value={confidence} options={CONFIDENCE_OPTIONS} onValueChange={setConfidence} />
      <FormGroup label="Evidence">
        {TIE_EVIDENCE.map((tag) => (
          <Checkbox key={tag} label={tag} checked={evidence.includes(tag)} onChange={toggle(tag)} />
        ))}
      </FormGroup>
      <TextAreaField name="note" label="Note" value={note} onValueChange={setNote} />
    </FormDialog>
  );
}
