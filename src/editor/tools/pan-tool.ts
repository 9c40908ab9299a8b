import type { Phase, PointerInput, Tool, ToolContext } from './tool';

/**
 * Pan by dragging. The canvas owns the camera, so this tool only reports the movement; the middle button and a
 * held space bar use it too, from any tool.
 */
export function createPanTool(onPan: (dx: number, dy: number) => void): Tool {
  let phase: Phase = 'idle';
  let last: PointerInput | null = null;
  return {
    id: 'pan',
    get phase() {
      return phase;
    },
    down(p) {
      phase = 'dragging';
      last = p;
    },
    move(p) {
      if (phase === 'idle' || !last) return;
      onPan(p.sx - last.sx, p.sy - last.sy);
      last = p;
    },
    up() {
      phase = 'idle';
      last = null;
    },
    cancel(_ctx: ToolContext) {
      phase = 'idle';
      last = null;
    },
    cursor() {
      return phase === 'dragging' ? 'grabbing' : 'grab';
    },
  };
}
