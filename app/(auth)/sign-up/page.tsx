import { SignUpForm } from '@/components/auth/sign-up-form';

export const metadata = { title: 'Create account' };

export default function SignUpPage() {
  return <SignUpForm />;
}
