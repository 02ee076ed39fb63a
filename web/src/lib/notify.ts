export type NoticeIntent = 'success' | 'error' | 'warning' | 'info';

export interface Notice {
  readonly intent: NoticeIntent;
  readonly title: string;
  readonly body?: string;
}

type Sink = (notice: Notice) => void;

let sink: Sink | null = null;
const pending: Notice[] = [];

/**
 * Toasts from outside React (the API client, the query cache). The app's toaster registers itself
 * as the sink; notices raised before it mounts are held and shown once it does.
 */
export function notify(notice: Notice): void {
  if (sink) sink(notice);
  else pending.push(notice);
}

export function registerNoticeSink(next: Sink): () => void {
  sink = next;
  for (const notice of pending.splice(0)) next(notice);
  return () => {
    if (sink === next) sink = null;
  };
}
