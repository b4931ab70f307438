import { type RefObject, useEffect, useState } from 'react';

/** True once the element has come near the screen; stays true. Lets long grids fetch images only as they scroll in. */
export function useInView(ref: RefObject<Element | null>, margin = '400px'): boolean {
  const [seen, setSeen] = useState(() => typeof IntersectionObserver === 'undefined');
  useEffect(() => {
    const el = ref.current;
    if (seen || !el) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) {
          setSeen(true);
          observer.disconnect();
        }
      },
      { rootMargin: margin },
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, seen, margin]);
  return seen;
}
