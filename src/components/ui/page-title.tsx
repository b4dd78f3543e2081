import { useEffect, type ReactNode } from 'react';

/** The page's h1; also sets the document title. */
export function PageTitle({ children, title }: { children: ReactNode; title?: string }) {
  useEffect(() => {
    const text = title ?? (typeof children === 'string' ? children : undefined);
    if (text) document.title = `${text} · Stickerline`;
  }, [children, title]);
  return <h1 className="text-2xl font-bold text-ink sm:text-3xl">{children}</h1>;
}
