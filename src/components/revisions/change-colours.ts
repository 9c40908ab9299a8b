import type { MemberChange } from '@shared/engine/revision-diff';

// One colour per kind of change, the same in both drawings, the legend and the table of members.
export const CHANGE_COLOURS: Readonly<Record<MemberChange, { fill: string; stroke: string; label: string }>> = {
  added: { fill: '#66bb6a', stroke: '#1b5e20', label: 'Added' },
  removed: { fill: '#ef5350', stroke: '#b71c1c', label: 'Removed' },
  moved: { fill: '#ffa726', stroke: '#e65100', label: 'Moved or resized' },
  changed: { fill: '#42a5f5', stroke: '#0d47a1', label: 'Other profile, turn or machining' },
  same: { fill: '#bdbdbd', stroke: '#616161', label: 'Unchanged' },
};
