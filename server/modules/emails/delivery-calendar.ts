import { createEvent } from 'ics';
import { addDays } from '../../../shared/domain/calendar-date';
import type { MailAttachment } from './mailer';

export interface DeliveryWindowEvent {
  /** Stable per contract, so a calendar replaces the proposed window with the agreed one. */
  contractId: string;
  title: string;
  description: string;
  /** First and last day of delivery, both inclusive (YYYY-MM-DD). */
  startOn: string;
  endOn: string;
  agreed: boolean;
  /** Increases with each new version of the window (RFC 5545 SEQUENCE). */
  sequence: number;
}

const dateArray = (date: string): [number, number, number] => {
  const [y, m, d] = date.split('-').map(Number);
  return [y, m, d];
};

/**
 * An iCalendar (RFC 5545) all-day event for a delivery window. DTEND of an all-day event is
 * exclusive, so it is the day after the last delivery day.
 */
export function deliveryWindowAttachment(event: DeliveryWindowEvent): MailAttachment {
  const { error, value } = createEvent({
    uid: `contract-${event.contractId}@duskhaul`,
    sequence: event.sequence,
    productId: '-//Duskhaul//Delivery windows//EN',
    method: 'PUBLISH',
    title: event.title,
    description: event.description,
    start: dateArray(event.startOn),
    end: dateArray(addDays(event.endOn, 1)),
    status: event.agreed ? 'CONFIRMED' : 'TENTATIVE',
    busyStatus: 'FREE',
    transp: 'TRANSPARENT',
  });
  if (error || !value) throw error ?? new Error('could not build the calendar file');
  return {
    filename: event.agreed ? 'delivery-window-agreed.ics' : 'delivery-window-proposed.ics',
    contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
    content: value,
  };
}
