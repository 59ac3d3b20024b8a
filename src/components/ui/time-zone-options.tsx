/** Every IANA time zone the browser knows, for a <select>. */
const zones: string[] = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : ['UTC'];

export function TimeZoneOptions() {
  return (
    <>
      {zones.map((zone) => (
        <option key={zone} value={zone}>
          {zone.replaceAll('_', ' ')}
        </option>
      ))}
    </>
  );
}
