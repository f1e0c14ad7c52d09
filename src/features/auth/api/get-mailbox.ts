import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { MailboxMessage } from '../../../../shared/schemas/api/people';
export type { MailboxMessage } from '../../../../shared/schemas/api/people';

export const getMailbox = () => apiFetch<{ messages: MailboxMessage[] }>('/mailbox');

export const mailboxQueryOptions = () => queryOptions({ queryKey: ['mailbox'], queryFn: getMailbox, retry: false, refetchInterval: 5_000 });

export const useMailbox = () => useQuery(mailboxQueryOptions());
