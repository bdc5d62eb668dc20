import { useState } from 'react';
import type { FieldIssue } from '@shared/api/errors';

/**
 * The last failed save of a form and the server's problems no field shows, for `<FormAlert>`.
 * Given `onReload` (fetch the latest record after a version conflict), `reload` runs it and
 * clears the failure, with `reloading` true meanwhile.
 */
export function useFormFailure(onReload?: () => Promise<unknown>) {
  const [failure, setFailure] = useState<unknown>(null);
  const [unplaced, setUnplaced] = useState<FieldIssue[]>([]);
  const [reloading, setReloading] = useState(false);
  const reload = onReload
    ? async () => {
        setReloading(true);
        try {
          await onReload();
          setFailure(null);
        } finally {
          setReloading(false);
        }
      }
    : undefined;
  return {
    failure,
    unplaced,
    reload,
    reloading,
    clear: () => {
      setFailure(null);
      setUnplaced([]);
    },
    fail: (error: unknown, issues: FieldIssue[]) => {
      setFailure(error);
      setUnplaced(issues);
    },
  };
}
