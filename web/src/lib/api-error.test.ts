import { describe, expect, it } from 'vitest';
import { ApiError, changedMeanwhile, describeError, errorTitle, toApiError } from './api-error';

const conflict = (message: string, details?: unknown) =>
  new ApiError({ statusCode: 409, error: 'Conflict', message, details });

describe('errors in the user’s words', () => {
  it('says someone else changed the item first, with the state that won, and never "409 Conflict"', () => {
    const lost = conflict(
      'Someone else changed discrepancy #12 first: it is now Accepted. Your move to Returned was not made.',
      [{ id: 12, status: 'accepted', version: 3 }],
    );
    expect(errorTitle(lost)).toBe('Someone else changed this first');
    expect(changedMeanwhile(lost)).toEqual({ status: 'accepted', label: 'Accepted' });
    expect(describeError(lost)).toBe(
      'Someone else changed discrepancy #12 first: it is now Accepted. Your move to Returned was not made.',
    );
    expect(`${errorTitle(lost)} ${describeError(lost)}`).not.toMatch(/409|Conflict/);
  });

  it('tells a refusal that is not a race apart from one that is', () => {
    const stamped = conflict(
      'Submittal 4 is already stamped "Rejected" by Tomasz Quell; this stamp was not applied.',
      [{ id: 4, status: 'stamped', version: 1 }],
    );
    expect(errorTitle(stamped)).toBe('Not possible now');
    expect(changedMeanwhile(stamped)).toBeNull();
  });

  it('names each kind of refusal without its status code', () => {
    const titles = [400, 403, 404, 413, 422, 429, 500, 503].map((statusCode) =>
      errorTitle(new ApiError({ statusCode, error: 'x', message: 'm' })),
    );
    expect(titles).toEqual([
      'Check what you entered',
      'Not allowed for your role',
      'Not found',
      'Too large',
      'Check what you entered',
      'Too many attempts',
      'The service could not do this',
      'The service cannot store this just now',
    ]);
    expect(titles.join(' ')).not.toMatch(/\d/);
  });

  it('gives a body of its own words when the server sent none, and a connection failure in words', () => {
    expect(describeError(toApiError(502, 'Bad Gateway', null))).toBe(
      'The service could not do this just now. Try again in a moment.',
    );
    expect(errorTitle(new TypeError('Failed to fetch'))).toBe('No connection to the service');
    expect(describeError(new TypeError('Failed to fetch'))).toMatch(/could not be reached/);
  });
});
