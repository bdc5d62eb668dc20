import type { InputHTMLAttributes, SelectHTMLAttributes, TextareaHTMLAttributes, Ref } from 'react';
import { useFieldContext } from './field';
import { cx } from './cx';

const control =
  'w-full rounded-md border bg-dusk-950 px-3 text-base text-dusk-50 placeholder:text-dusk-400 focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ember-300 disabled:opacity-60';

function useWiring(id?: string, describedBy?: string) {
  const field = useFieldContext();
  return {
    id: id ?? field?.id,
    'aria-describedby': describedBy ?? field?.describedBy,
    'aria-invalid': field?.invalid || undefined,
    border: field?.invalid ? 'border-rosehip-400' : 'border-dusk-500',
  };
}

/** A text or number input wired to its Field's label and error. */
export function Input({
  className,
  ref,
  ...rest
}: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> }) {
  const { border, ...wiring } = useWiring(rest.id, rest['aria-describedby']);
  return (
    <input
      ref={ref}
      {...wiring}
      {...rest}
      id={wiring.id}
      className={cx(control, 'min-h-11', border, className)}
    />
  );
}

/** A select wired to its Field. */
export function Select({
  className,
  ref,
  ...rest
}: SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  const { border, ...wiring } = useWiring(rest.id, rest['aria-describedby']);
  return (
    <select
      ref={ref}
      {...wiring}
      {...rest}
      id={wiring.id}
      className={cx(control, 'min-h-11', border, className)}
    />
  );
}

/** A multi-line text input wired to its Field. */
export function Textarea({
  className,
  ref,
  ...rest
}: TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> }) {
  const { border, ...wiring } = useWiring(rest.id, rest['aria-describedby']);
  return (
    <textarea
      ref={ref}
      rows={3}
      {...wiring}
      {...rest}
      id={wiring.id}
      className={cx(control, 'py-2', border, className)}
    />
  );
}
