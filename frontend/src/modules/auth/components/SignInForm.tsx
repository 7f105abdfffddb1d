import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import { useSignIn } from '@/modules/auth/hooks/useSignIn';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { TextField } from '@/modules/ui/components/FormFields';
import { FieldReader } from '@/modules/ui/utils/formFields';

type SignInField = 'email' | 'password';

export type SignInFormProps = {
  onSignedIn: () => void;
};

/** E-mail and password, with the server's answer shown in the form. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<Partial<Record<SignInField, string>>>({});
  const signIn = useSignIn();

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const reader = new FieldReader<SignInField>();
    reader.text('email', email, { required: true, pattern: [/^[^\s@]+@[^\s@]+$/, 'not an e-mail address'] });
    if (password === '') reader.fail('password', 'required');
    setErrors(reader.errors);
    if (!reader.ok) return;
    signIn.mutate({ email, password }, { onSuccess: onSignedIn });
  };

  const serverFieldErrors = fieldErrorsOf(signIn.error);
  const formError = formErrorOf(signIn.error, ['email', 'password']);

  return (
    <form onSubmit={handleSubmit} noValidate className="sc-signin-form">
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError}
        </Callout>
      )}
      <TextField
        name="email"
        label="E-mail"
        type="email"
        autoComplete="username"
        autoFocus
        value={email}
        onValueChange={setEmail}
        error={errors.email ?? serverFieldErrors.email}
      />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
        value={password}
        onValueChange={setPassword}
        error={errors.password ?? serverFieldErrors.password}
      />
      <Button type="submit" intent={Intent.PRIMARY} text="Sign in" loading={signIn.isPending} fill size="large" />
    </form>
  );
}
