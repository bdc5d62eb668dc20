import { useState, type InputHTMLAttributes } from 'react';
import { Input } from './input';

interface ScaledNumberInputProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'value' | 'onChange' | 'type'
> {
  /** The stored value (cents, kg …), or undefined when empty. */
  value: number | null | undefined;
  onChange: (value: number | undefined) => void;
  /** Stored → shown (cents → dollars, kg → lb). */
  toDisplay: (stored: number) => number;
  /** Shown → stored. */
  fromDisplay: (shown: number) => number;
  /** Decimals shown for a stored value. */
  decimals?: number;
}

const show = (
  value: number | null | undefined,
  toDisplay: (n: number) => number,
  decimals: number,
) =>
  value === null || value === undefined || Number.isNaN(value)
    ? ''
    : String(Number(toDisplay(value).toFixed(decimals)));

/**
 * A number typed in the user's terms (dollars, pounds) and kept in the stored unit (cents, kg).
 * Text that is not a number is passed on as NaN so the form's schema reports it. The text is
 * taken from `value` once, when the input mounts (remount it with a new key to show another
 * value): a form library may hand back its default for an emptied field, which must not
 * overwrite what the user is typing.
 */
export function ScaledNumberInput({
  value,
  onChange,
  toDisplay,
  fromDisplay,
  decimals = 2,
  ...rest
}: ScaledNumberInputProps) {
  const [text, setText] = useState(() => show(value, toDisplay, decimals));
  return (
    <Input
      {...rest}
      type="text"
      inputMode="decimal"
      value={text}
      onChange={(event) => {
        const next = event.target.value;
        setText(next);
        const trimmed = next.trim().replace(/,/g, '');
        const parsed = trimmed === '' ? undefined : fromDisplay(Number(trimmed));
        onChange(parsed);
      }}
    />
  );
}
