import type { Metadata } from 'next';
import { ResetRequestForm } from '@/components/account/reset-request-form';

export const metadata: Metadata = { title: 'Reset the password' };

export default function ResetPasswordPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Reset the password</h1>
      <p className="text-sm text-steel-600 dark:text-steel-300">
        Enter the address of your account. We e-mail a link that lets you choose a new password; it works once, within an hour.
      </p>
      <ResetRequestForm />
    </section>
  );
}
