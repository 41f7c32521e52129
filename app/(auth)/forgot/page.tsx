import { ForgotForm } from '@/components/auth/forgot-form';

export const metadata = { title: 'Reset password' };

export default function ForgotPage() {
  return <ForgotForm />;
}
