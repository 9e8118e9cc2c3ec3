/** The viewer's private iCalendar (RFC 5545) feed; the URL carries the secret token. */
export interface CalendarFeedResponse {
  url: string;
  /** Path part only (`/api/calendar/<token>.ics`), for clients that know their origin. */
  path: string;
  createdAt: string;
}
