import { useState } from 'react';
import { checkerboardStyle } from '../../../components/ui/checkerboard';
import { classNames } from '../../../components/ui/class-names';

type MotifThumbnailProps = {
  src: string;
  /** Empty when the motif's name is written right beside the picture. */
  alt?: string;
  className?: string;
  cell?: number;
  /** `high`: on the screen now, fetched at once and first; `low` (the default): fetched as it nears the screen. */
  priority?: 'high' | 'low';
};

// A square box of fixed size, so the grid never jumps while thumbnails arrive; the picture
// loads only when it nears the screen, unless the caller knows it is on the screen already.
export function MotifThumbnail({ src, alt = '', className, cell = 8, priority = 'low' }: MotifThumbnailProps) {
  const [state, setState] = useState<'loading' | 'shown' | 'broken'>('loading');
  return (
    <div className={classNames('relative aspect-square overflow-hidden rounded-md', className)} style={checkerboardStyle(cell)}>
      {state !== 'broken' ? (
        <img
          src={src}
          alt={alt}
          loading={priority === 'high' ? 'eager' : 'lazy'}
          fetchPriority={priority === 'high' ? 'high' : 'auto'}
          decoding="async"
          draggable={false}
          onLoad={() => setState('shown')}
          onError={() => setState('broken')}
          className={classNames('absolute inset-0 size-full object-contain p-2 transition-opacity', state === 'shown' ? 'opacity-100' : 'opacity-0')}
        />
      ) : (
        <span className="absolute inset-0 flex items-center justify-center p-2 text-center text-sm text-ink-soft">Picture unavailable</span>
      )}
    </div>
  );
}
