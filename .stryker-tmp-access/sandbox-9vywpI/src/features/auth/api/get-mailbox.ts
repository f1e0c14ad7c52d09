// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface MailboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

export const getMailbox = () => apiFetch<{ messages: MailboxMessage[] }>('/mailbox');

export const mailboxQueryOptions = () => queryOptions({ queryKey: ['mailbox'], queryFn: getMailbox, retry: false, refetchInterval: 5_000 });

export const useMailbox = () => useQuery(mailboxQueryOptions());
