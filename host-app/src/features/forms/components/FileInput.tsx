import type { ChangeEvent } from 'react';
import { FieldFrame } from './FieldFrame';

export interface FileInputProps {
  label: string;
  hint?: string;
  accept: string;
  errors?: string[];
  disabled?: boolean;
  onFile: (file: File | null) => void;
}

/** A labelled native file input: the browser's own picker is the most accessible one. */
export function FileInput({ label, hint, accept, errors, disabled, onFile }: FileInputProps) {
  const onChange = (event: ChangeEvent<HTMLInputElement>) => onFile(event.target.files?.[0] ?? null);
  return (
    <FieldFrame label={label} hint={hint} errors={errors}>
      {(control) => <input {...control} className="native-file" type="file" accept={accept} disabled={disabled} onChange={onChange} />}
    </FieldFrame>
  );
}
