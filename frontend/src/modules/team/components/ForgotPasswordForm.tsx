import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useRequestPasswordReset } from '@/modules/team/hooks/useAccountTokens';
import { readResetEmail } from '@/modules/team/utils/teamForms';
import { TextField } from '@/modules/ui/components/FormFields';

/**
 * Ask for a reset link. The answer is the same whether or not the address has an account, so
 * the form never tells anyone which addresses are registered.
 */
export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();
  const request = useRequestPasswordReset();

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readResetEmail(email);
    setError(result.ok ? undefined : result.errors.email);
    if (result.ok) request.mutate(result.input.email);
  };

  if (request.isSuccess) {
    return (
      <Callout intent={Intent.SUCCESS} icon={IconNames.ENVELOPE} className="sc-form-callout">
        If the address has an account, a message is on its way with a link to choose a new password. The link works once
        and expires after a while.
      </Callout>
    );
  }

  const formError = formErrorOf(request.error, []);
  return (
    <form onSubmit={handleSubmit} noValidate className="sc-signin-form">
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError}
        </Callout>
      )}
      <TextField name="email" label="E-mail" type="email" autoComplete="username" autoFocus value={email} onValueChange={setEmail} error={error} />
      <Button type="submit" intent={Intent.PRIMARY} text="Send a reset link" loading={request.isPending} fill size="large" />
    </form>
  );
}
