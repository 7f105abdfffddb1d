import { Checkbox } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState } from 'react';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { TextAreaField, TextField } from '@/modules/ui/components/FormFields';

export type HypothesisValues = { name: string; description: string | null; copyCurrent: boolean };

export type HypothesisDialogProps = {
  isOpen: boolean;
  currentName: string | null;
  submitting: boolean;
  error: unknown;
  onClose: () => void;
  onSubmit: (values: HypothesisValues) => void;
};

/** A new correlation hypothesis, empty or a copy of the one on screen. */
export function HypothesisDialog({ isOpen, currentName, submitting, error, onClose, onSubmit }: HypothesisDialogProps) {
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [copyCurrent, setCopyCurrent] = useState(true);
  const [nameError, setNameError] = useState<string | undefined>();
  const handleCopyChange = () => setCopyCurrent((previous) => !previous);
  const handleSubmit = () => {
    if (name.trim() === '') {
      setNameError('required');
      return;
    }
    setNameError(undefined);
    onSubmit({ name: name.trim(), description: description.trim() === '' ? null : description.trim(), copyCurrent: copyCurrent && currentName !== null });
  };
  return (
    <FormDialog
      title="New hypothesis"
      icon={IconNames.PLUS}
      isOpen={isOpen}
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={submitting}
      submitLabel="Create"
      formError={formErrorOf(error, ['name', 'description'])}
    >
      <TextField name="name" label="Name" value={name} onValueChange={setName} error={nameError ?? fieldErrorsOf(error).name} autoFocus />
      <TextAreaField name="description" label="Description" value={description} onValueChange={setDescription} error={fieldErrorsOf(error).description} />
      {currentName !== null && <Checkbox label={`Copy every tie of “${currentName}”`} checked={copyCurrent} onChange={handleCopyChange} />}
    </FormDialog>
  );
}
