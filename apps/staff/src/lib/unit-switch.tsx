import { useId } from 'react';
import type { MassUnit, TempUnit, Units } from './units';
import { useUnits } from './use-units';

interface Choice<V extends string> {
  value: V;
  label: string;
}

const massChoices: Choice<MassUnit>[] = [
  { value: 'g', label: 'g' },
  { value: 'oz', label: 'oz' },
];
const tempChoices: Choice<TempUnit>[] = [
  { value: 'C', label: '°C' },
  { value: 'F', label: '°F' },
];

function Segmented<V extends string>({
  legend,
  choices,
  value,
  onChange,
}: {
  legend: string;
  choices: Choice<V>[];
  value: V;
  onChange: (value: V) => void;
}) {
  const name = useId();
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="float-left mr-1 text-sm font-extrabold text-muted">{legend}</legend>
      <span className="inline-flex rounded-full border-2 border-plum-300 p-0.5">
        {choices.map((choice) => (
          <label
            key={choice.value}
            className={`cursor-pointer rounded-full px-3 py-1 text-sm font-extrabold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-sugar-500 ${
              choice.value === value ? 'bg-plum-800 text-paper' : 'text-plum-800'
            }`}
          >
            <input
              type="radio"
              className="sr-only"
              name={name}
              value={choice.value}
              checked={choice.value === value}
              onChange={() => onChange(choice.value)}
            />
            {choice.label}
          </label>
        ))}
      </span>
    </fieldset>
  );
}

/** Switches between g and oz, °C and °F; the choice is remembered in this browser. */
export function UnitSwitch({ show = ['mass', 'temp'] }: { show?: readonly (keyof Units)[] }) {
  const [units, setUnits] = useUnits();
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      {show.includes('mass') && (
        <Segmented legend="Weights" choices={massChoices} value={units.mass} onChange={(mass) => setUnits({ mass })} />
      )}
      {show.includes('temp') && (
        <Segmented
          legend="Temperatures"
          choices={tempChoices}
          value={units.temp}
          onChange={(temp) => setUnits({ temp })}
        />
      )}
    </div>
  );
}
