import { shapePath } from '@/components/sampler/geometry';
import type { Shape } from '@/lib/color/types';

// A stored photo on the grey stage with its sampled regions drawn over it.
export function RegionsOnPhoto({ photoId, regions, caption }: { photoId: string; regions: { name: string; shape: Shape }[]; caption: string }) {
  return (
    <figure className="rounded-md bg-stage p-2">
      <div className="relative">
        {/* eslint-disable-next-line @next/next/no-img-element -- pixel-exact overlay on our own authenticated photo route; next/image would resize it */}
        <img src={`/api/photos/${photoId}/image`} alt={caption} className="block h-auto w-full" />
        <svg viewBox="0 0 1 1" preserveAspectRatio="none" className="pointer-events-none absolute inset-0 h-full w-full" aria-hidden>
          {regions.map((r) => (
            <g key={r.name}>
              <path d={shapePath(r.shape)} fill="none" stroke="#000" strokeWidth={3} vectorEffect="non-scaling-stroke" />
              <path d={shapePath(r.shape)} fill="none" stroke="#fff" strokeWidth={1.5} vectorEffect="non-scaling-stroke" />
            </g>
          ))}
        </svg>
      </div>
      <figcaption className="mt-1 text-xs text-white">{caption}: {regions.map((r) => r.name).join(', ')}</figcaption>
    </figure>
  );
}
