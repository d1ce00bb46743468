import { createStore } from 'zustand/vanilla';
import type { Shape } from '@/lib/color/types';

export type Tool = 'rect' | 'ellipse' | 'polygon' | 'pan';
export const NEUTRAL = '__neutral__';

// UI state of one sampler: the tool, zoom and pan, the selected zone, the
// shapes drawn so far and a polygon in progress. Never a copy of server data.
export type SamplerState = {
  tool: Tool;
  zoom: number;
  panX: number;
  panY: number;
  selected: string;
  shapes: Record<string, Shape>;
  draft: [number, number][];
  setTool: (t: Tool) => void;
  setZoom: (z: number) => void;
  panBy: (dx: number, dy: number) => void;
  resetView: () => void;
  select: (zone: string) => void;
  setShape: (zone: string, shape: Shape | null) => void;
  addDraftPoint: (p: [number, number]) => void;
  clearDraft: () => void;
};

export const MIN_ZOOM = 1;
export const MAX_ZOOM = 8;

export function createSamplerStore(init: { zones: string[]; shapes?: Record<string, Shape> }) {
  return createStore<SamplerState>()((set) => ({
    tool: 'rect',
    zoom: 1,
    panX: 0,
    panY: 0,
    selected: init.zones[0] ?? NEUTRAL,
    shapes: { ...(init.shapes ?? {}) },
    draft: [],
    setTool: (tool) => set({ tool, draft: [] }),
    setZoom: (z) => set((s) => {
      const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z));
      return zoom === 1 ? { zoom, panX: 0, panY: 0 } : { zoom, panX: s.panX, panY: s.panY };
    }),
    panBy: (dx, dy) => set((s) => ({ panX: s.panX + dx, panY: s.panY + dy })),
    resetView: () => set({ zoom: 1, panX: 0, panY: 0 }),
    select: (selected) => set({ selected, draft: [] }),
    setShape: (zone, shape) => set((s) => {
      const shapes = { ...s.shapes };
      if (shape) shapes[zone] = shape;
      else delete shapes[zone];
      return { shapes, draft: [] };
    }),
    addDraftPoint: (p) => set((s) => ({ draft: [...s.draft, p] })),
    clearDraft: () => set({ draft: [] }),
  }));
}

export type SamplerStore = ReturnType<typeof createSamplerStore>;
