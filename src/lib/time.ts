/** A time in the brewery's zone with the zone named, e.g. "Dec 1, 14:05 AST". */
export function showTime(iso: string, timeZone: string, withDate = false): string {
  return new Intl.DateTimeFormat('en-US', {
    timeZone,
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZoneName: 'short',
    ...(withDate ? { year: 'numeric', month: 'short', day: 'numeric' } : {}),
  }).format(new Date(iso));
}
