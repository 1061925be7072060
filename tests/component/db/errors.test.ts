/** Storage failures in words: opening the store is not saving a project. */
import { describe, expect, it } from 'vitest';
import { describeOpenError, describeStorageError } from '../../../src/db/errors.ts';

describe('describeOpenError', () => {
  it('an unknown failure to open IndexedDB says the store could not be opened, not "could not be saved: <raw error>"', () => {
    const message = describeOpenError(
      Object.assign(new Error('UnknownError: Internal error opening backing store'), { name: 'UnknownError' }),
    );
    expect(message).toMatch(/^The browser’s project store \(IndexedDB\) could not be opened \(UnknownError\)/);
    expect(message).toMatch(/export the project file/);
    expect(message).not.toMatch(/could not be saved|backing store/);
  });

  it('a blocked upgrade keeps its own advice', () => {
    expect(describeOpenError({ name: 'BlockedError' })).toBe(describeStorageError({ name: 'BlockedError' }));
  });
});
