/** The parts of a stored photo an <img> needs (MenuPhotoView in @fryline/schemas has them). */
export interface PhotoSource {
  src: string;
  srcset: string;
  width: number;
  height: number;
}

/**
 * A menu item's photo: the browser picks the stored size that fits (srcset
 * and sizes), loads it only when it comes near the screen, and keeps its
 * place meanwhile (width and height give the shape), so nothing jumps.
 */
export function MenuPhoto({ photo, alt, sizes, className = '' }: { photo: PhotoSource; alt: string; sizes: string; className?: string }) {
  return (
    <img
      src={photo.src}
      srcSet={photo.srcset}
      sizes={sizes}
      width={photo.width}
      height={photo.height}
      alt={alt}
      loading="lazy"
      decoding="async"
      className={`block h-auto max-w-full bg-crumb object-cover ${className}`}
    />
  );
}
