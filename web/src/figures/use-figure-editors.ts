import { useEffect, useState } from 'react';
import type { PresenceAwareness } from '../editor/notebook-context';

/**
 * Says in the shared presence that this person has a figure's settings open,
 * and returns the names of the others who have the same figure's settings open.
 */
export function useFigureEditors(awareness: PresenceAwareness | undefined, figureId: string | null, editing: boolean): string[] {
  const [others, setOthers] = useState<string[]>([]);
  useEffect(() => {
    if (!awareness || !figureId) return;
    if (editing) awareness.setLocalStateField('editingFigure', figureId);
    const read = () => {
      const names = new Set<string>();
      awareness.getStates().forEach((state, client) => {
        const user = state.user as { name?: string } | undefined;
        if (client !== awareness.clientID && state.editingFigure === figureId && user?.name) names.add(user.name);
      });
      setOthers([...names]);
    };
    read();
    awareness.on('change', read);
    return () => {
      awareness.off('change', read);
      if (editing) awareness.setLocalStateField('editingFigure', null);
    };
  }, [awareness, figureId, editing]);
  return others;
}
