import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { Card } from '@vatside/ui/Card';
import { StartStudioForm } from '../../features/studios/components/StartStudioForm.tsx';

export function Component() {
  return (
    <RequireSignIn>
      <div className="mx-auto max-w-2xl space-y-6">
        <div>
          <h1 className="font-display text-4xl font-semibold">Start a studio</h1>
          <p className="mt-1 text-lg text-vat-800">
            Your studio is where your dye-alongs, colorways and community live. You will be its
            host.
          </p>
        </div>
        <Card>
          <StartStudioForm />
        </Card>
      </div>
    </RequireSignIn>
  );
}
