/* eslint-disable @next/next/no-img-element -- the bytes come from our own authenticated route, unoptimised on purpose */

// A photo on the neutral stage (sRGB #777777, about L* 50) with a thin light rule:
// colour is judged against its surround, so nothing tinted sits next to it.
export function PhotoOnStage({ photoId, alt, className = '' }: { photoId: string; alt: string; className?: string }) {
  return (
    <div className={`flex items-center justify-center bg-stage p-3 ${className}`}>
      <img
        src={`/api/photos/${encodeURIComponent(photoId)}/image`}
        alt={alt}
        className="max-h-96 w-auto max-w-full border border-stage-rule object-contain"
        loading="lazy"
      />
    </div>
  );
}
