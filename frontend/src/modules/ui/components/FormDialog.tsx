import { Button, Callout, Dialog, DialogBody, DialogFooter, Intent } from '@blueprintjs/core';
import { IconNames, type IconName } from '@blueprintjs/icons';
import type { FormEvent, ReactNode } from 'react';

export type FormDialogProps = {
  title: ReactNode;
  icon?: IconName;
  isOpen: boolean;
  onClose: () => void;
  onSubmit: () => void;
  submitting?: boolean;
  submitLabel?: string;
  /** A problem with the form as a whole (not tied to a field), shown above the fields. */
  formError?: string | null;
  /** The record changed since the form read it: offer to reload instead of saving. */
  conflict?: boolean;
  onReload?: () => void;
  /** Buttons on the left of the footer (e.g. delete). */
  footerStart?: ReactNode;
  width?: number;
  children: ReactNode;
};

/** A dialog holding one form: the fields in the body, cancel and save in the footer. */
export function FormDialog({
  title,
  icon,
  isOpen,
  onClose,
  onSubmit,
  submitting = false,
  submitLabel = 'Save',
  formError,
  conflict = false,
  onReload,
  footerStart,
  width = 520,
  children,
}: FormDialogProps) {
  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onSubmit();
  };
  return (
    <Dialog title={title} icon={icon} isOpen={isOpen} onClose={onClose} style={{ width }} canOutsideClickClose={!submitting}>
      <form onSubmit={handleSubmit} noValidate>
        <DialogBody>
          {conflict ? (
            <Callout intent={Intent.WARNING} icon={IconNames.REFRESH} className="sc-form-callout" title="Changed by someone else">
              This record was changed by someone else after you opened it. Reload to see the current version, then make
              your change again.
              {onReload && (
                <div className="sc-callout-actions">
                  <Button intent={Intent.WARNING} icon={IconNames.REFRESH} text="Reload" onClick={onReload} />
                </div>
              )}
            </Callout>
          ) : (
            formError && (
              <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
                {formError}
              </Callout>
            )
          )}
          {children}
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} disabled={submitting} />
              <Button type="submit" intent={Intent.PRIMARY} text={submitLabel} loading={submitting} disabled={conflict} />
            </>
          }
        >
          {footerStart}
        </DialogFooter>
      </form>
    </Dialog>
  );
}
