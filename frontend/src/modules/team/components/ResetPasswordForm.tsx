import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/app/paths';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { useResetPassword } from '@/modules/team/hooks/useAccountTokens';
import { MIN_PASSWORD_LENGTH, readNewPassword, type NewPasswordField } from '@/modules/team/utils/teamForms';
import { TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type ResetPasswordFormProps = { token: string };

/** A new password from a reset link; an expired or used link is refused with the server's words. */
export function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const [password, setPassword] = useState('');
  const [confirmation, setConfirmation] = useState('');
  const [errors, setErrors] = useState<FieldErrors<NewPasswordField>>({});
  const reset = useResetPassword();

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readNewPassword(password, confirmation);
    setErrors(result.ok ? {} : result.errors);
    if (result.ok) reset.mutate({ token, password: result.input.password });
  };

  if (reset.isSuccess) {
    return (
      <Callout intent={Intent.SUCCESS} icon={IconNames.TICK_CIRCLE} className="sc-form-callout">
        Your password is changed. <Link to={paths.signIn()}>Sign in</Link> with the new one.
      </Callout>
    );
  }

  const serverErrors = fieldErrorsOf(reset.error);
  const formError = formErrorOf(reset.error, ['password']);
  return (
    <form onSubmit={handleSubmit} noValidate className="sc-signin-form">
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError} <Link to={paths.forgotPassword()}>Ask for a new link</Link>.
        </Callout>
      )}
      <TextField
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        autoFocus
        helperText={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        value={password}
        onValueChange={setPassword}
        error={errors.password ?? serverErrors.password}
      />
      <TextField
        name="confirmation"
        label="New password again"
        type="password"
        autoComplete="new-password"
        value={confirmation}
        onValueChange={setConfirmation}
        error={errors.confirmation}
      />
      <Button type="submit" intent={Intent.PRIMARY} text="Set the new password" loading={reset.isPending} fill size="large" />
    </form>
  );
}
