import { Button, Card, Flex, Heading, Link, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { LIMITS } from '@upwell/common';
import { useRegister } from '../../api/auth';
import { AuthFrame } from '../../components/AuthFrame';
import { ErrorNote } from '../../components/ErrorNote';

/** Account creation: name, e-mail, password. */
export default function SignUpPage() {
  const register = useRegister();
  const navigate = useNavigate();
  const [form, setForm] = useState({ name: '', email: '', password: '' });
  const set = (k: keyof typeof form) => (e: React.ChangeEvent<HTMLInputElement>) => setForm({ ...form, [k]: e.target.value });

  async function submit(e: FormEvent) {
    e.preventDefault();
    await register.mutateAsync(form).then(() => navigate('/notebooks', { replace: true }), () => {});
  }

  return (
    <AuthFrame>
      <Card size="4">
        <form onSubmit={submit} aria-label="Create an account">
          <Flex direction="column" gap="4">
            <Heading as="h1" size="6">
              Create an account
            </Heading>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Name
              </Text>
              <TextField.Root autoComplete="name" required maxLength={LIMITS.nameMax} value={form.name} onChange={set('name')} />
            </label>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                E-mail
              </Text>
              <TextField.Root type="email" autoComplete="email" required value={form.email} onChange={set('email')} />
            </label>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Password
              </Text>
              <TextField.Root
                type="password"
                autoComplete="new-password"
                required
                minLength={LIMITS.passwordMin}
                value={form.password}
                onChange={set('password')}
                aria-describedby="password-rule"
              />
              <Text id="password-rule" as="div" size="1" color="gray" mt="1">
                At least {LIMITS.passwordMin} characters.
              </Text>
            </label>
            <ErrorNote error={register.error} />
            <Button type="submit" size="3" loading={register.isPending}>
              Create account
            </Button>
            <Text size="2" color="gray">
              Already have an account?{' '}
              <Link asChild>
                <RouterLink to="/sign-in">Sign in</RouterLink>
              </Link>
            </Text>
          </Flex>
        </form>
      </Card>
    </AuthFrame>
  );
}
