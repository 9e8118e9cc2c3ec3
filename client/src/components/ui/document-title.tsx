import { APP_NAME } from '@broodsilk/shared';

/** The browser tab's title for a page; React 19 hoists <title> into the head. */
export function DocumentTitle({ title }: { title: string }) {
  return <title>{title.includes(APP_NAME) ? title : `${title} · ${APP_NAME}`}</title>;
}
