import { site } from '../config/site';

/** Sets the browser tab's title (React hoists <title> into the document head). */
export function PageTitle({ children }: { children: string }) {
  return <title>{`${children} · ${site.name}`}</title>;
}
