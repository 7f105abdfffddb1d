import { Alert, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';

export type DeleteAlertProps = {
  /** What is being deleted, e.g. `unit "peat"`; null hides the alert. */
  what: ReactNode | null;
  onConfirm: () => void;
  onCancel: () => void;
  deleting?: boolean;
  error?: unknown;
  children?: ReactNode;
};

/** Asks before deleting, and shows why the server refused (e.g. a unit still holding samples). */
export function DeleteAlert({ what, onConfirm, onCancel, deleting = false, error, children }: DeleteAlertProps) {
  const message = formErrorOf(error, []);
  return (
    <Alert
      isOpen={what !== null}
      intent={Intent.DANGER}
      icon={IconNames.TRASH}
      confirmButtonText="Delete"
      cancelButtonText="Keep"
      onConfirm={onConfirm}
      onCancel={onCancel}
      loading={deleting}
      canEscapeKeyCancel={!deleting}
    >
      <p>Delete {what}? This cannot be undone here (the audit trail keeps a copy).</p>
      {children}
      {message && <p className="sc-danger-text">{message}</p>}
    </Alert>
  );
}
