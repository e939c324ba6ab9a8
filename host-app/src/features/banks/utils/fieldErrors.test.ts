import { describe, expect, it } from 'vitest';
import { fieldErrors } from './fieldErrors';

describe('fieldErrors', () => {
  it('hands each message to the field it names and keeps the rest for the top of the form', () => {
    const e = fieldErrors([
      { field: 'options[1].text', message: 'Option B is empty.' },
      { field: 'options[10].text', message: 'Option K.' },
      { field: 'key.unit', message: 'Unknown unit.' },
      { field: 'surprise', message: 'Something else.' },
    ]);
    expect(e.at('options[1]')).toEqual(['Option B is empty.']);
    expect(e.at('key.unit')).toEqual(['Unknown unit.']);
    expect(e.unplaced().map((d) => d.message)).toEqual(['Option K.', 'Something else.']);
  });

  it('reads the validation pipe’s dotted indexes (options.1.text) as options[1].text', () => {
    expect(fieldErrors([{ field: 'options.1.text', message: 'Too long.' }]).at('options[1]')).toEqual(['Too long.']);
  });
});
