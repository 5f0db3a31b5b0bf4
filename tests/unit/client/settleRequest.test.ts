// A move's answer must not be overwritten by a read of the request that was asked before the move
// and answers after it (seen on a slow machine: the request page showed the state before a resubmit).
import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import type { RequestDetail } from '../../../shared/requests/types';
import { requestKeys, settle } from '../../../features/requests/requestCache';

const detailAt = (state: string, version: number) => ({ id: 'r-1', state, version }) as unknown as RequestDetail;

describe('settling a request after a move', () => {
  it('keeps the move’s answer when an older read of the request lands afterwards', async () => {
    const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    let answerOldRead: (d: RequestDetail) => void = () => {};
    const oldRead = queryClient.fetchQuery({
      queryKey: requestKeys.detail('r-1'),
      queryFn: () => new Promise<RequestDetail>((resolve) => (answerOldRead = resolve)),
    }).catch(() => null);

    await settle(queryClient, detailAt('section_review', 5));
    answerOldRead(detailAt('revising', 4));
    await oldRead;

    expect(queryClient.getQueryData<RequestDetail>(requestKeys.detail('r-1'))).toMatchObject({ state: 'section_review', version: 5 });
  });
});
