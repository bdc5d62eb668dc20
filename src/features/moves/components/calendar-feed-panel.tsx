import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FormAlert } from '@/components/ui/form-alert';
import { Input } from '@/components/ui/input';
import { Section } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/skeleton';
import { formatDateTime } from '@/lib/units';
import { useCalendarFeed, useRotateCalendarFeed } from '../api/calendar-feed';

/** "Moves in your phone's calendar": make or replace a private iCalendar link. */
export function CalendarFeedPanel() {
  const feed = useCalendarFeed();
  const rotate = useRotateCalendarFeed();
  const [url, setUrl] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const [confirmReplace, setConfirmReplace] = useState(false);

  const make = () =>
    rotate.mutate(undefined, {
      onSuccess: (link) => {
        setUrl(`${window.location.origin}${link.path}`);
        setCopied(false);
        setConfirmReplace(false);
      },
    });
  const copy = async () => {
    if (!url) return;
    await navigator.clipboard?.writeText(url).catch(() => undefined);
    setCopied(true);
  };

  return (
    <Section title="Moves in your phone's calendar">
      <div className="flex max-w-2xl flex-col gap-3">
        <p className="text-dusk-100">
          Subscribe to this link in your phone's calendar app to see each move night with its
          departure, arrival and dawn times. It updates as moves change.
        </p>
        {feed.isPending ? (
          <Skeleton className="h-6 w-64" />
        ) : feed.isError ? (
          <FormAlert error={feed.error} />
        ) : (
          <p className="text-sm text-dusk-300">
            {feed.data.exists
              ? `You have a link, made ${formatDateTime(feed.data.createdAt!)}${feed.data.lastUsedAt ? `, last read ${formatDateTime(feed.data.lastUsedAt)}` : ', not read yet'}. It cannot be shown again: replace it to see a new one.`
              : 'You have no calendar link yet.'}
          </p>
        )}
        {url && (
          <Alert tone="warning" title="Your calendar link (shown once)">
            <p>
              Keep it private: anyone with it can read your operation's move nights. Replace it if
              it gets out.
            </p>
            <div className="mt-2 flex flex-wrap gap-2">
              <Input
                readOnly
                value={url}
                aria-label="Calendar link"
                className="flex-1"
                onFocus={(e) => e.target.select()}
              />
              <Button size="md" variant="secondary" onClick={() => void copy()}>
                {copied ? 'Copied' : 'Copy'}
              </Button>
            </div>
          </Alert>
        )}
        <FormAlert error={rotate.error} />
        {feed.data?.exists && !url ? (
          confirmReplace ? (
            <div className="flex flex-wrap items-center gap-2">
              <span className="text-sm text-dusk-100">The old link stops working at once.</span>
              <Button variant="danger" busy={rotate.isPending} onClick={make}>
                Replace link
              </Button>
              <Button variant="ghost" onClick={() => setConfirmReplace(false)}>
                Keep the old one
              </Button>
            </div>
          ) : (
            <Button
              variant="secondary"
              className="self-start"
              onClick={() => setConfirmReplace(true)}
            >
              Replace link
            </Button>
          )
        ) : (
          !url && (
            <Button className="self-start" busy={rotate.isPending} onClick={make}>
              Create link
            </Button>
          )
        )}
      </div>
    </Section>
  );
}
