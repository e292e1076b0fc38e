import type { Metadata } from 'next';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { CircuitsHeading } from '@/components/circuits/CircuitsHeading';
import { CircuitTable } from '@/components/circuits/CircuitTable';
import { AppShell } from '@/components/shell/AppShell';
import { authOptions } from '@/lib/auth/options';

export const metadata: Metadata = { title: 'Circuits' };

export default async function CircuitsPage() {
  const session = await getServerSession(authOptions);
  if (!session?.user) redirect('/sign-in?callbackUrl=/circuits');

  const userName = session.user.name || session.user.email || 'Signed in';

  return (
    <AppShell userName={userName}>
      <div className="space-y-6">
        <CircuitsHeading />
        <CircuitTable />
      </div>
    </AppShell>
  );
}
