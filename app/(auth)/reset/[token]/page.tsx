import { ResetForm } from '@/components/auth/reset-form';

export const metadata = { title: 'Choose a new password' };

export default async function ResetPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return <ResetForm token={token} />;
}
