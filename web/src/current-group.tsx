import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';
import type { GroupSummary } from '@upwell/common';
import { useMe } from './api/auth';

const KEY = 'upwell.currentGroup';

interface CurrentGroup {
  group: GroupSummary | null;
  groups: GroupSummary[];
  choose(groupId: string): void;
}

const Ctx = createContext<CurrentGroup>({ group: null, groups: [], choose: () => {} });

/** Remembers which of the person's groups they are working in. */
export function CurrentGroupProvider({ children }: { children: ReactNode }) {
  const me = useMe();
  const [chosen, setChosen] = useState<string | null>(() => localStorage.getItem(KEY));
  const groups = useMemo(() => me.data?.groups ?? [], [me.data]);
  const group = groups.find((g) => g.id === chosen) ?? groups[0] ?? null;
  const value = useMemo(
    () => ({
      group,
      groups,
      choose(groupId: string) {
        localStorage.setItem(KEY, groupId);
        setChosen(groupId);
      },
    }),
    [group, groups],
  );
  return <Ctx.Provider value={value}>{children}</Ctx.Provider>;
}

/** The group the person is working in, and their other groups. */
export function useCurrentGroup(): CurrentGroup {
  return useContext(Ctx);
}
