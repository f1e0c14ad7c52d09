import type { Control, UseFormRegister, UseFormSetValue } from 'react-hook-form';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { FACILITY_WATER_CLASSES, findFacilityWaterClass, supplyFitsClass } from '../../../../shared/scenario/facility-water';
import type { Scenario } from '../../../../shared/scenario/schema';
import { asAirLoopField, fieldsFor, heatReuseFields, liquidFields, liquidShareField, systemFields, systemKinds } from '../lib/scenario-fields';
import { newHeatReuse, type ScenarioFormValues } from '../lib/scenario-form';
import { QuantityField } from './quantity-field';

type FormControl = Control<ScenarioFormValues, unknown, Scenario>;

/**
 * The hybrid hall's inputs: the share of heat to liquid, the liquid loop (facility-water class or a typed supply,
 * the CDU approach, heat rejection), the air loop (any single kind with its own fields) and heat reuse.
 */
export function HybridFields({
  control,
  register,
  setValue,
  system,
  disabled,
}: {
  control: FormControl;
  register: UseFormRegister<ScenarioFormValues>;
  setValue: UseFormSetValue<ScenarioFormValues>;
  system: ScenarioFormValues['system'];
  disabled: boolean;
}) {
  const { unitSystem } = useUnitSystem();
  const { liquid, air, heatReuse } = system;
  const chosenClass = liquid.facilityWaterClassId ? findFacilityWaterClass(liquid.facilityWaterClassId) : undefined;
  const outsideClass = chosenClass && !supplyFitsClass(liquid.chilledWaterSupplyC, chosenClass);
  const set = (path: Parameters<typeof setValue>[0], value: unknown) => setValue(path, value as never, { shouldDirty: true, shouldValidate: true });
  return (
    <div className="space-y-4" data-testid="hybrid-fields">
      <QuantityField control={control} field={liquidShareField} disabled={disabled} />

      <section aria-labelledby="liquid-loop-heading" className="space-y-1">
        <h3 id="liquid-loop-heading" className="text-sm font-semibold">
          Liquid loop: facility water to the CDUs
        </h3>
        <div className="flex flex-wrap items-center gap-1.5" role="group" aria-label="Facility-water class">
          <span className="mr-1 text-sm text-ink-soft">Class</span>
          {FACILITY_WATER_CLASSES.map((c) => (
            <button
              key={c.id}
              type="button"
              disabled={disabled}
              aria-pressed={liquid.facilityWaterClassId === c.id}
              title={`${c.note} ${c.edition}.`}
              onClick={() => {
                set('system.liquid.facilityWaterClassId', c.id);
                set('system.liquid.chilledWaterSupplyC', c.presetSupplyC);
              }}
              className={`rounded border px-2 py-0.5 text-sm ${liquid.facilityWaterClassId === c.id ? 'border-harbour bg-harbour text-paper' : 'border-rule bg-panel hover:bg-mist'}`}
            >
              {c.label}
            </button>
          ))}
          <button
            type="button"
            disabled={disabled}
            aria-pressed={!liquid.facilityWaterClassId}
            onClick={() => set('system.liquid.facilityWaterClassId', undefined)}
            className={`rounded border px-2 py-0.5 text-sm ${!liquid.facilityWaterClassId ? 'border-harbour bg-harbour text-paper' : 'border-rule bg-panel hover:bg-mist'}`}
          >
            Custom
          </button>
        </div>
        <p className="text-xs text-ink-soft">
          {chosenClass ? `${chosenClass.label}: ${chosenClass.note} ${chosenClass.edition}.` : 'A custom supply: the temperature you type.'} The equipment
          maker’s coolant limits (flow, pressure, temperature, water chemistry) come before the class.
        </p>
        {outsideClass && (
          <p role="alert" className="text-xs font-medium text-signal-warn">
            The supply typed is outside {chosenClass.label}; choose Custom or a class it fits.
          </p>
        )}
        <div className="grid grid-cols-[minmax(11rem,15rem)_1fr] items-baseline gap-x-3 py-1.5">
          <label htmlFor="liquid-heat-rejection" className="text-sm">
            Heat rejection
          </label>
          <select
            id="liquid-heat-rejection"
            {...register('system.liquid.heatRejection')}
            className="w-fit rounded border border-rule bg-panel px-2 py-1 text-sm"
          >
            <option value="dry-cooler">Dry cooler (dry-bulb, optional spray)</option>
            <option value="cooling-tower">Cooling tower (wet-bulb)</option>
          </select>
        </div>
        {fieldsFor(liquidFields, 'water-side', liquid.heatRejection).map((f) => (
          <QuantityField key={f.path} control={control} field={f} disabled={disabled} />
        ))}
        <p className="num text-xs text-ink-soft" data-testid="coolant-supply">
          Coolant to the cold plates: {formatQuantity('temperature', unitSystem, liquid.chilledWaterSupplyC + liquid.cduApproachK)} · facility-water return{' '}
          {formatQuantity('temperature', unitSystem, liquid.chilledWaterSupplyC + liquid.chilledWaterDeltaTK)}
        </p>
      </section>

      <section aria-labelledby="air-loop-heading" className="space-y-1">
        <h3 id="air-loop-heading" className="text-sm font-semibold">
          Air loop: the rest of the heat, to the hall air
        </h3>
        <div className="grid grid-cols-[minmax(11rem,15rem)_1fr] items-baseline gap-x-3 py-1.5">
          <label htmlFor="air-loop-kind" className="text-sm">
            Air-loop system
          </label>
          <select id="air-loop-kind" {...register('system.air.kind')} className="w-fit rounded border border-rule bg-panel px-2 py-1 text-sm">
            {systemKinds
              .filter((k) => k.kind !== 'hybrid')
              .map((k) => (
                <option key={k.kind} value={k.kind}>
                  {k.label}
                </option>
              ))}
          </select>
        </div>
        {air.kind === 'water-side' && (
          <div className="grid grid-cols-[minmax(11rem,15rem)_1fr] items-baseline gap-x-3 py-1.5">
            <label htmlFor="air-heat-rejection" className="text-sm">
              Air-loop heat rejection
            </label>
            <select id="air-heat-rejection" {...register('system.air.heatRejection')} className="w-fit rounded border border-rule bg-panel px-2 py-1 text-sm">
              <option value="cooling-tower">Cooling tower (wet-bulb)</option>
              <option value="dry-cooler">Dry cooler (dry-bulb, optional spray)</option>
            </select>
          </div>
        )}
        {fieldsFor(systemFields, air.kind, air.kind === 'water-side' ? air.heatRejection : undefined).map((f) => {
          const moved = asAirLoopField(f);
          return <QuantityField key={moved.path} control={control} field={moved} disabled={disabled} />;
        })}
      </section>

      <section aria-labelledby="heat-reuse-heading" className="space-y-1">
        <h3 id="heat-reuse-heading" className="text-sm font-semibold">
          Heat reuse
        </h3>
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="accent-harbour"
            disabled={disabled}
            checked={heatReuse !== undefined}
            onChange={(e) => set('system.heatReuse', e.target.checked ? newHeatReuse : undefined)}
          />
          Estimate the heat available to a heating network from the facility-water return
        </label>
        {heatReuse && (
          <>
            {heatReuseFields.map((f) => (
              <QuantityField key={f.path} control={control} field={f} disabled={disabled} />
            ))}
            <label className="flex items-center gap-2 text-sm">
              <input type="checkbox" className="accent-harbour" disabled={disabled} {...register('system.heatReuse.heatPump')} />A heat pump lifts the return to
              that temperature when it is below it (COP from the lift model)
            </label>
            <p className="text-xs text-ink-soft">This is heat available at the return, not a contract with a heat customer.</p>
          </>
        )}
      </section>
    </div>
  );
}
