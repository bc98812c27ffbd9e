const FORMAT = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

/**
 * A stored time (ISO string), shown in UTC: the same text on the server and in the browser,
 * so hydration never disagrees, and the same for every member of an organisation.
 */
export function DateTime({ iso }: { iso: string }) {
  return <time dateTime={iso}>{FORMAT.format(new Date(iso))} UTC</time>;
}
