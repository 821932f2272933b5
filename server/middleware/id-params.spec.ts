import { HttpError } from './http-error';
import { idParams, parseId, PG_INTEGER_MAX } from './id-params';

describe('idParams', () => {
  it('reads whole numbers from 1 to the PostgreSQL integer maximum, 2147483647 (PostgreSQL manual, "Numeric Types")', () => {
    expect(idParams({ id: '12', photoId: '7' }, { id: 'That lot', photoId: 'That photo' })).toEqual({ id: 12, photoId: 7 });
    expect(parseId('2147483647', 'That lot')).toBe(2 ** 31 - 1);
    expect(PG_INTEGER_MAX).toBe(2 ** 31 - 1);
  });

  it.each(['2147483648', '99999999999999999999', '0', '-1', '1.5', '1e3', ' 1', '0x10', '', 'abc', '007'])('answers 404 for %j', (raw) => {
    const error = catchError(() => parseId(raw, 'That lot'));
    expect(error).toBeInstanceOf(HttpError);
    expect(error).toMatchObject({ status: 404, code: 'not_found', message: 'That lot was not found.' });
  });

  it('answers 404 for a missing or repeated parameter', () => {
    expect(catchError(() => idParams({}, { id: 'That lot' }))).toMatchObject({ status: 404 });
    expect(catchError(() => idParams({ id: ['1', '2'] }, { id: 'That lot' }))).toMatchObject({ status: 404 });
  });
});

function catchError(f: () => unknown): unknown {
  try {
    f();
  } catch (e) {
    return e;
  }
  return undefined;
}
