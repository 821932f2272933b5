import { HttpErrorResponse } from '@angular/common/http';
import { catchError, map, Observable, of, startWith } from 'rxjs';
import { apiErrorMessage } from './api-error';

/** Where a page's request stands: loading, answered, or failed with a message fit to show. */
export type RequestState<T> =
  | { status: 'loading' }
  | { status: 'ok'; value: T }
  | { status: 'error'; message: string; httpStatus: number };

/** Turns a request into its states, so a page can render each (errors use the API's own message). */
export function requestState<T>(request: Observable<T>): Observable<RequestState<T>> {
  return request.pipe(
    map((value): RequestState<T> => ({ status: 'ok', value })),
    catchError((error) =>
      of<RequestState<T>>({
        status: 'error',
        message: apiErrorMessage(error),
        httpStatus: error instanceof HttpErrorResponse ? error.status : 0,
      }),
    ),
    startWith<RequestState<T>>({ status: 'loading' }),
  );
}

/** The answered value, or null while loading or after an error. */
export function valueOf<T>(state: RequestState<T> | { status: 'idle' }): T | null {
  return state.status === 'ok' ? state.value : null;
}

/** The error message, or null. */
export function errorOf(state: RequestState<unknown> | { status: 'idle' }): string | null {
  return state.status === 'error' ? state.message : null;
}
