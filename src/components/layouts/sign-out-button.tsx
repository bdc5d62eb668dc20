import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import {
  forgetTonightOnThisDevice,
  unsentTonightChanges,
} from '@/features/tonight/lib/tonight-context';
import { isStaff, useSignOut, useUser } from '@/lib/auth';
import { Button } from '../ui/button';
import { Dialog } from '../ui/dialog';

/**
 * Signs out and leaves nothing of the session on the device: Tonight's queue and snapshots and
 * the service worker's cached API answers go too. Changes from Tonight that the office does not
 * have yet are never thrown away without asking.
 */
export function SignOutButton() {
  const user = useUser();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const [checking, setChecking] = useState(false);
  const [unsent, setUnsent] = useState(0);

  const finish = () =>
    signOut.mutate(undefined, {
      onSettled: () => {
        setUnsent(0);
        void forgetTonightOnThisDevice()
          .catch(() => undefined) // storage blocked (private mode): nothing was kept
          .finally(() => navigate(paths.signIn(), { replace: true }));
      },
    });

  const start = async () => {
    // Only the operation's people use Tonight; a grower's browser has no queue to ask about.
    if (!isStaff(user)) return finish();
    setChecking(true);
    const waiting = await unsentTonightChanges(user.id).catch(() => 0);
    setChecking(false);
    if (waiting > 0) setUnsent(waiting);
    else finish();
  };

  return (
    <>
      <Button
        variant="secondary"
        size="sm"
        onClick={() => void start()}
        busy={checking || signOut.isPending}
      >
        Sign out
      </Button>
      <Dialog open={unsent > 0} title="Changes not sent yet" onClose={() => setUnsent(0)}>
        <p className="text-dusk-100">
          {unsent === 1 ? '1 change from Tonight has' : `${unsent} changes from Tonight have`} not
          reached the office. Signing out throws {unsent === 1 ? 'it' : 'them'} away on this device.
          Stay signed in and open Tonight where there is signal to send{' '}
          {unsent === 1 ? 'it' : 'them'} first.
        </p>
        <div className="mt-5 flex flex-wrap justify-end gap-3">
          <Button variant="danger" onClick={finish} busy={signOut.isPending}>
            Sign out and discard
          </Button>
          <Button onClick={() => setUnsent(0)}>Stay signed in</Button>
        </div>
      </Dialog>
    </>
  );
}
