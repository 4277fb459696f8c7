import type { MeResponse } from '@shoalbook/shared';
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { paths, safeNextPath } from '../config/paths';
import { api, isApiError } from './api-client';
import { forgetKeptReads } from './offline-reads';
import { deviceDb } from './send-queue/runtime';
import { forgetLastFix } from './use-position';

/** Who is signed in; `null` when nobody is (the API answers 401). */
export const meQuery = queryOptions({
  queryKey: ['me'],
  queryFn: async (): Promise<MeResponse | null> => {
    try {
      return await api.get<MeResponse>('/auth/me');
    } catch (error) {
      if (isApiError(error, 401)) return null;
      throw error;
    }
  },
});

/** The signed-in person and their crews, or null. */
export function useMe() {
  return useQuery(meQuery);
}

/** Like {@link useMe} for screens behind {@link requireUser}: the data is always there. */
export function useSignedInMe(): MeResponse {
  const { data } = useQuery(meQuery);
  if (!data) throw new Error('useSignedInMe used outside a signed-in route');
  return data;
}

/** Route loader: sends signed-out visitors to sign-in, coming back here afterwards. */
export function requireUser(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQuery);
    if (!me) {
      const url = new URL(request.url);
      throw redirect(paths.signIn.href(url.pathname + url.search));
    }
    return null;
  };
}

/** Route loader for "/": the first crew, or the page that starts one. */
export function homeRedirect(queryClient: QueryClient) {
  return async (args: LoaderFunctionArgs) => {
    await requireUser(queryClient)(args);
    const me = await queryClient.ensureQueryData(meQuery);
    const first = me?.crews[0];
    return redirect(first ? paths.crew.href(first.crewId) : paths.newCrew.href());
  };
}

/** After sign-in or sign-up: remember who it is and drop anything cached for the previous person. */
export function rememberSignedIn(queryClient: QueryClient, me: MeResponse): void {
  // Lists kept for offline reading belong to whoever read them: start afresh.
  void forgetKeptReads(deviceDb).catch(() => undefined);
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'me' });
  queryClient.setQueryData(meQuery.queryKey, me);
}

/** After sign-out or a password reset: nobody is signed in and nothing cached may leak to the next person. */
export function forgetSignedIn(queryClient: QueryClient): void {
  forgetLastFix();
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'me' });
  queryClient.setQueryData(meQuery.queryKey, null);
}

/** Route loader for sign-in and sign-up: someone already signed in goes on to where they were headed. */
export function redirectIfSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    // If the API cannot be asked, show the form anyway: submitting it reports the problem.
    const me = await queryClient.ensureQueryData(meQuery).catch(() => null);
    if (me) throw redirect(safeNextPath(new URL(request.url).searchParams.get('next')) ?? paths.home.href());
    return null;
  };
}
