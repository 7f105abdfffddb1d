import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { useAcceptInvitation } from '@/modules/team/hooks/useAccountTokens';
import { MIN_PASSWORD_LENGTH, readNewPassword, type NewPasswordField } from '@/modules/team/utils/teamForms';
import { TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type AcceptInvitationFormProps = {
  token: string;
  /** Called signed in, with the project to land in when the answer names exactly one. */
  onAccepted: (projectId: string | null) => void;
};

/** Name and a new password for the invited address; an existing account gives its own password. */
export function AcceptInvitationForm({ token, onAccepted }: AcceptInvitationFormProps) {
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const [confirmation, setConfirmation] = useState('');
  const [errors, setErrors] = useState<FieldErrors<NewPasswordField>>({});
  const accept = useAcceptInvitation();

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readNewPassword(password, confirmation);
    setErrors(result.ok ? {} : result.errors);
    if (!result.ok) return;
    accept.mutate(
      { token, password: result.input.password, displayName },
      { onSuccess: onAccepted },
    );
  };

  const serverErrors = fieldErrorsOf(accept.error);
  const formError = formErrorOf(accept.error, ['password', 'displayName']);

  return (
    <form onSubmit={handleSubmit} noValidate className="sc-signin-form">
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError}
        </Callout>
      )}
      <TextField
        name="displayName"
        label="Your name"
        labelInfo="(as colleagues see it)"
        autoComplete="name"
        autoFocus
        value={displayName}
        onValueChange={setDisplayName}
        error={serverErrors.displayName}
      />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        helperText={`At least ${MIN_PASSWORD_LENGTH} characters. If the address already has an account, enter its password.`}
        value={password}
        onValueChange={setPassword}
        error={errors.password ?? serverErrors.password}
      />
      <TextField
        name="confirmation"
        label="Password again"
        type="password"
        autoComplete="new-password"
        value={confirmation}
        onValueChange={setConfirmation}
        error={errors.confirmation}
      />
      <Button type="submit" intent={Intent.PRIMARY} text="Join the project" loading={accept.isPending} fill size="large" />
    </form>
  );
}
