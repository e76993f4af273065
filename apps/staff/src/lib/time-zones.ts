/**
 * The time zones offered for a bake day: the IANA names a pop-up in North
 * America is most likely to need, and a few beyond, each with a plain label.
 */

export interface ZoneChoice {
  /** The IANA name the API stores, e.g. America/Denver. */
  zone: string;
  label: string;
}

export interface ZoneGroup {
  region: string;
  zones: ZoneChoice[];
}

const groups: ZoneGroup[] = [
  {
    region: 'United States',
    zones: [
      { zone: 'America/New_York', label: 'Eastern (New York)' },
      { zone: 'America/Chicago', label: 'Central (Chicago)' },
      { zone: 'America/Denver', label: 'Mountain (Denver)' },
      { zone: 'America/Phoenix', label: 'Arizona (Phoenix, no daylight saving)' },
      { zone: 'America/Los_Angeles', label: 'Pacific (Los Angeles)' },
      { zone: 'America/Anchorage', label: 'Alaska (Anchorage)' },
      { zone: 'Pacific/Honolulu', label: 'Hawaii (Honolulu)' },
      { zone: 'America/Puerto_Rico', label: 'Atlantic (Puerto Rico)' },
    ],
  },
  {
    region: 'Canada',
    zones: [
      { zone: 'America/St_Johns', label: 'Newfoundland (St. John’s)' },
      { zone: 'America/Halifax', label: 'Atlantic (Halifax)' },
      { zone: 'America/Toronto', label: 'Eastern (Toronto)' },
      { zone: 'America/Winnipeg', label: 'Central (Winnipeg)' },
      { zone: 'America/Regina', label: 'Saskatchewan (Regina)' },
      { zone: 'America/Edmonton', label: 'Mountain (Edmonton)' },
      { zone: 'America/Vancouver', label: 'Pacific (Vancouver)' },
    ],
  },
  {
    region: 'Elsewhere',
    zones: [
      { zone: 'America/Mexico_City', label: 'Mexico City' },
      { zone: 'Europe/London', label: 'London' },
      { zone: 'Europe/Dublin', label: 'Dublin' },
      { zone: 'Europe/Paris', label: 'Paris' },
      { zone: 'Europe/Berlin', label: 'Berlin' },
      { zone: 'Australia/Sydney', label: 'Sydney' },
      { zone: 'Australia/Perth', label: 'Perth' },
      { zone: 'Pacific/Auckland', label: 'Auckland' },
      { zone: 'UTC', label: 'UTC' },
    ],
  },
];

/** Whether this browser knows the zone (an unknown one would throw when formatting times). */
export function isKnownZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** "America/Los_Angeles" → "America/Los Angeles". */
export function zoneName(zone: string): string {
  return zone.replace(/_/g, ' ');
}

/**
 * The zones to choose from, by region; `current` is added under "Other"
 * when it is not among them (a bake day elsewhere, or the browser's own zone).
 */
export function zoneGroups(current: string): ZoneGroup[] {
  const known = groups.map((group) => ({ ...group, zones: group.zones.filter((choice) => isKnownZone(choice.zone)) }));
  const listed = known.some((group) => group.zones.some((choice) => choice.zone === current));
  if (listed || current === '' || !isKnownZone(current)) return known;
  return [...known, { region: 'Other', zones: [{ zone: current, label: zoneName(current) }] }];
}

/** The zone this browser is set to, or UTC when it does not say. */
export function browserZone(): string {
  const zone = Intl.DateTimeFormat().resolvedOptions().timeZone;
  return zone && isKnownZone(zone) ? zone : 'UTC';
}
