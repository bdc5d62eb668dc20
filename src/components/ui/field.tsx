import { createContext, useContext, useId, type ReactNode } from 'react';
import { cx } from './cx';

interface FieldContextValue {
  id: string;
  describedBy?: string;
  invalid: boolean;
}

const FieldContext = createContext<FieldContextValue | null>(null);

/** The id and error wiring of the field an input sits in. */
export const useFieldContext = () => useContext(FieldContext);

export interface FieldProps {
  label: ReactNode;
  error?: string;
  hint?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** A labelled form field with an optional hint and its error shown beneath. */
export function Field({ label, error, hint, children, className }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <FieldContext.Provider value={{ id, describedBy, invalid: Boolean(error) }}>
      <div className={cx('flex flex-col gap-1', className)}>
        <label htmlFor={id} className="text-sm font-medium text-dusk-100">
          {label}
        </label>
        {children}
        {hint && (
          <p id={hintId} className="text-sm text-dusk-300">
            {hint}
          </p>
        )}
        {error && (
          <p id={errorId} className="text-sm font-medium text-rosehip-300">
            {error}
          </p>
        )}
      </div>
    </FieldContext.Provider>
  );
}
