import type { ComponentPropsWithoutRef } from 'react';

export interface NativeSelectOption {
  value: string;
  label: string;
}

export interface NativeSelectProps extends Omit<ComponentPropsWithoutRef<'select'>, 'children'> {
  options: readonly NativeSelectOption[];
}

/**
 * The browser's own select, styled like the Radix fields: it is keyboard- and screen-reader-friendly
 * everywhere, including phones and jsdom, without a popup layer.
 */
export function NativeSelect({ options, className, ...props }: NativeSelectProps) {
  return (
    <select className={['native-select', className].filter(Boolean).join(' ')} {...props}>
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </select>
  );
}
