import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StationBoard } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

const REFRESH_MS = 60_000;

export const boardKeys = { all: ['boards'] as const, one: (id: number) => ['boards', id] as const };

export const getBoards = () => apiFetch<{ items: StationBoard[] }>(api.boards);
export const boardsQueryOptions = () => queryOptions({ queryKey: boardKeys.all, queryFn: getBoards, refetchInterval: REFRESH_MS });
export const useBoards = () => useQuery(boardsQueryOptions());

// The board refreshes itself so an approval or an expiry reaches the shop floor without a reload.
export const getBoard = (id: number) => apiFetch<StationBoard>(api.board(id));
export const boardQueryOptions = (id: number) =>
  queryOptions({ queryKey: boardKeys.one(id), queryFn: () => getBoard(id), refetchInterval: REFRESH_MS, refetchOnWindowFocus: true });
export const useBoard = (id: number) => useQuery(boardQueryOptions(id));
