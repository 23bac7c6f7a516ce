import { Button, Callout, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { type FormEvent, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useSignIn } from '../api/use-sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    signIn.mutate({ email: email.trim(), password }, { onSuccess: onSignedIn });
  };

  return (
    <form className="tr-sign-in-form" onSubmit={submit}>
      {signIn.isError && (
        <Callout className="tr-sign-in-alert" intent={Intent.DANGER} title="Not signed in" role="alert" compact>
          {errorMessage(signIn.error)}
        </Callout>
      )}
      <FormGroup label="E-mail" labelFor="sign-in-email">
        <InputGroup
          id="sign-in-email"
          type="email"
          autoComplete="username"
          autoFocus
          required
          size="large"
          value={email}
          onValueChange={setEmail}
        />
      </FormGroup>
      <FormGroup label="Password" labelFor="sign-in-password">
        <InputGroup
          id="sign-in-password"
          type="password"
          autoComplete="current-password"
          required
          size="large"
          value={password}
          onValueChange={setPassword}
        />
      </FormGroup>
      <Button type="submit" intent={Intent.PRIMARY} size="large" fill loading={signIn.isPending} text="Sign in" />
    </form>
  );
}
