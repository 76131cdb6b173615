import { Box, Button, Card, Flex, Heading, Link, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link as RouterLink, useLocation, useNavigate } from 'react-router';
import { useLogin } from '../../api/auth';
import { ErrorNote } from '../../components/ErrorNote';
import { AuthFrame } from '../../components/AuthFrame';
import { DemoAccounts } from './DemoAccounts';

/** Sign-in with e-mail and password. */
export default function SignInPage() {
  const login = useLogin();
  const navigate = useNavigate();
  const location = useLocation();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const next = (location.state as { from?: string } | null)?.from ?? '/notebooks';

  async function submit(e: FormEvent) {
    e.preventDefault();
    await login.mutateAsync({ email, password }).then(() => navigate(next, { replace: true }), () => {});
  }

  return (
    <AuthFrame>
      <Card size="4">
        <form onSubmit={submit} aria-label="Sign in">
          <Flex direction="column" gap="4">
            <Heading as="h1" size="6">
              Sign in
            </Heading>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                E-mail
              </Text>
              <TextField.Root type="email" autoComplete="email" required value={email} onChange={(e) => setEmail(e.target.value)} />
            </label>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Password
              </Text>
              <TextField.Root type="password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} />
            </label>
            <ErrorNote error={login.error} />
            <Button type="submit" size="3" loading={login.isPending}>
              Sign in
            </Button>
            <Text size="2" color="gray">
              New to Upwell?{' '}
              <Link asChild>
                <RouterLink to="/sign-up">Create an account</RouterLink>
              </Link>
            </Text>
          </Flex>
        </form>
      </Card>
      <DemoAccounts
        onPick={(p) => {
          setEmail(p.email);
          setPassword(p.password);
        }}
      />
      <Box />
    </AuthFrame>
  );
}
