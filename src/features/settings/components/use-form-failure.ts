import { useState } from 'react';
import type { FieldIssue } from '@shared/api/errors';

/** The last failed save of a form and the server's problems no field shows. */
export function useFormFailure() {
  const [failure, setFailure] = useState<unknown>(null);
  const [unplaced, setUnplaced] = useState<FieldIssue[]>([]);
  return {
    failure,
    unplaced,
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
