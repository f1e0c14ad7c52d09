import { useId, useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { useUnitSystem } from '@/lib/unit-system';
import { fieldUnitLabel, inputText, parseInputText, rangeText } from '../lib/field-units';
import { inWords, type NumericField } from '../lib/scenario-fields';

/**
 * One numeric scenario input. The form keeps SI; the box shows and takes the chosen unit system.
 * While the box has focus it keeps the text as typed ("77." stays "77."), so conversion never fights the typist.
 */
export function QuantityField<T extends FieldValues, TOut extends FieldValues>({
  control,
  field,
  disabled,
}: {
  control: Control<T, unknown, TOut>;
  field: NumericField;
  disabled?: boolean;
}) {
  const { unitSystem } = useUnitSystem();
  const {
    field: { ref: inputRef, value, onChange, onBlur },
    fieldState,
  } = useController({ control, name: field.path as Path<T> });
  const [draft, setDraft] = useState<string | null>(null);
  const id = useId();
  const unit = fieldUnitLabel(field.unit, unitSystem);
  const range = rangeText(field.unit, unitSystem, field.min, field.max);
  const error = fieldState.error?.message;
  // The schema words its range in SI; show the person's own units instead.
  const message = error && (/^must be a number from/.test(error) ? `Enter a number from ${range}.` : inWords(error));
  return (
    <div className="grid grid-cols-[7.5rem_4.5rem_minmax(0,1fr)] items-baseline gap-x-3 py-1.5 sm:grid-cols-[minmax(11rem,15rem)_7.5rem_4.5rem_1fr]">
      <label htmlFor={id} className="col-span-full text-sm text-ink sm:col-span-1">
        {field.label}
      </label>
      <input
        id={id}
        ref={inputRef}
        name={field.path}
        inputMode="decimal"
        disabled={disabled}
        aria-invalid={message ? true : undefined}
        aria-describedby={`${id}-help${message ? ` ${id}-error` : ''}`}
        className={`num w-full rounded border bg-panel px-2 py-1 text-right text-sm disabled:bg-paper disabled:text-ink-soft ${
          message ? 'border-signal-bad' : 'border-rule'
        }`}
        value={draft ?? inputText(field.unit, unitSystem, value as number)}
        onFocus={() => setDraft(inputText(field.unit, unitSystem, value as number))}
        onChange={(e) => {
          setDraft(e.target.value);
          onChange(parseInputText(field.unit, unitSystem, e.target.value));
        }}
        onBlur={() => {
          setDraft(null);
          onBlur();
        }}
      />
      <span className="text-xs text-ink-soft">{unit}</span>
      <span className="num text-xs text-ink-faint">{range}</span>
      <p id={`${id}-help`} className="col-span-full text-xs text-ink-soft sm:col-start-2 sm:col-end-5">
        {field.help}
      </p>
      {message && (
        <p id={`${id}-error`} role="alert" className="col-span-full text-xs font-medium text-signal-bad sm:col-start-2 sm:col-end-5">
          {message}
        </p>
      )}
    </div>
  );
}
