import { zoneGroups } from './time-zones';

/** The <option>s of a time-zone select, grouped by region, with `current` kept in the list. */
export function ZoneOptions({ current }: { current: string }) {
  return zoneGroups(current).map((group) => (
    <optgroup key={group.region} label={group.region}>
      {group.zones.map((choice) => (
        <option key={choice.zone} value={choice.zone}>
          {choice.label}
        </option>
      ))}
    </optgroup>
  ));
}
