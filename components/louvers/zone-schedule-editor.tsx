"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useId } from "react";
import { useFieldArray, useForm, useWatch, type Resolver } from "react-hook-form";
import { NEW_PERIOD, scheduleFormSchema, scheduleToForm, type ScheduleForm } from "@/components/louvers/schedule-form";
import { Button } from "@/components/ui/button";
import type { ZoneSchedule } from "@/lib/energy/schedule-schema";
import { WEEKDAYS } from "@/lib/energy/types";
import { asNumber, errorAt } from "@/components/ui/form-values";

const DAY_LABELS: Record<string, string> = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" };

const CONTROL = "block w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm aria-[invalid=true]:border-danger";

interface Props {
  zoneName: string;
  schedule: ZoneSchedule | undefined;
  readOnly: boolean;
  /** The validated schedule (undefined = none); the editor records it as one undo entry. */
  onApply: (schedule: ZoneSchedule | undefined) => void;
}

/**
 * A zone's weekday occupancy periods, each with a fixed louver angle or "automatic", validated
 * with the layout's own schedule schema (hours, days, angle, no overlap on a common day); errors
 * inline next to the period they concern. Apply records one undo entry.
 */
export function ZoneScheduleEditor({ zoneName, schedule, readOnly, onApply }: Props) {
  const id = useId();
  const defaults = scheduleToForm(schedule);
  const form = useForm<ScheduleForm, unknown, ZoneSchedule | undefined>({
    resolver: zodResolver(scheduleFormSchema as never) as unknown as Resolver<ScheduleForm, unknown, ZoneSchedule | undefined>,
    defaultValues: defaults,
  });
  const { register, handleSubmit, formState, control, reset } = form;
  const periods = useFieldArray({ control, name: "periods" });
  const key = JSON.stringify(defaults);
  // Show the zone's schedule again when it changes under the form (an undo, another apply).
  useEffect(() => {
    reset(JSON.parse(key) as ScheduleForm);
  }, [key, reset]);
  const e = formState.errors;
  const modes = (useWatch({ control, name: "periods" }) ?? []).map((p) => p.louverMode);

  return (
    <form
      noValidate
      aria-label="Occupancy schedule"
      className="space-y-3 border-t border-line pt-3"
      onSubmit={handleSubmit((value) => onApply(value))}
    >
      <div>
        <h3 className="text-sm font-semibold">Occupancy schedule</h3>
        <p className="text-xs text-muted">
          Weekday periods of {zoneName} with their louver setting, for the energy figures. Hours 0–24, start before end; periods on a common day must not overlap.
        </p>
      </div>
      <fieldset disabled={readOnly} className="space-y-3">
        {periods.fields.length === 0 ? <p className="text-xs text-muted">No periods: the zone has no schedule.</p> : null}
        {periods.fields.map((field, i) => {
          // The schema counts periods from 0 ("period 0: …"); the screen counts from 1 and shows the message under the period.
          const periodError = (errorAt(e, `periods.${i}`) ?? errorAt(e, `periods.${i}.root`))?.replace(/^period \d+: /, "");
          const daysError = errorAt(e, `periods.${i}.days`);
          const startError = errorAt(e, `periods.${i}.startHour`);
          const endError = errorAt(e, `periods.${i}.endHour`);
          const angleError = errorAt(e, `periods.${i}.louver.openingAngleDeg`);
          return (
            <fieldset key={field.id} aria-label={`Period ${i + 1}`} className="space-y-2 rounded-md border border-line p-2">
              <legend className="px-1 text-xs font-semibold">Period {i + 1}</legend>
              <div role="group" aria-label={`Period ${i + 1} days`} className="flex flex-wrap gap-x-2 gap-y-1 text-xs">
                {WEEKDAYS.map((d) => (
                  <label key={d} className="flex items-center gap-1">
                    <input type="checkbox" value={d} {...register(`periods.${i}.days`)} />
                    {DAY_LABELS[d]}
                  </label>
                ))}
              </div>
              <div className="grid grid-cols-2 gap-2">
                <label className="space-y-1 text-xs font-medium">
                  <span>Period {i + 1} start (h)</span>
                  <input
                    type="number"
                    step="any"
                    inputMode="decimal"
                    aria-invalid={startError || periodError ? true : undefined}
                    className={CONTROL}
                    {...register(`periods.${i}.startHour`, { setValueAs: asNumber })}
                  />
                </label>
                <label className="space-y-1 text-xs font-medium">
                  <span>Period {i + 1} end (h)</span>
                  <input
                    type="number"
                    step="any"
                    inputMode="decimal"
                    aria-invalid={endError || periodError ? true : undefined}
                    className={CONTROL}
                    {...register(`periods.${i}.endHour`, { setValueAs: asNumber })}
                  />
                </label>
              </div>
              <div className="grid grid-cols-2 gap-2">
                <label className="space-y-1 text-xs font-medium">
                  <span>Period {i + 1} louvers</span>
                  <select className={CONTROL} {...register(`periods.${i}.louverMode`)}>
                    <option value="automatic">Automatic</option>
                    <option value="fixed">Fixed angle</option>
                  </select>
                </label>
                {modes[i] === "fixed" ? (
                  <label className="space-y-1 text-xs font-medium">
                    <span>Period {i + 1} opening angle (°)</span>
                    <input
                      type="number"
                      step="any"
                      inputMode="decimal"
                      aria-invalid={angleError ? true : undefined}
                      className={CONTROL}
                      {...register(`periods.${i}.openingAngleDeg`, { setValueAs: asNumber })}
                    />
                  </label>
                ) : null}
              </div>
              <div aria-live="polite" className="space-y-0.5 text-xs text-danger">
                {[periodError, daysError && `Days: ${daysError}`, startError && `Start: ${startError}`, endError && `End: ${endError}`, angleError && `Angle: ${angleError}`]
                  .filter(Boolean)
                  .map((m) => (
                    <p key={m}>{m}</p>
                  ))}
              </div>
              {readOnly ? null : (
                <Button variant="quiet" onClick={() => periods.remove(i)}>
                  Remove period {i + 1}
                </Button>
              )}
            </fieldset>
          );
        })}
      </fieldset>
      {readOnly ? null : (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => periods.append({ ...NEW_PERIOD, days: [...NEW_PERIOD.days] })}>
            Add period
          </Button>
          <Button type="submit" id={`${id}-apply`}>
            Apply schedule
          </Button>
        </div>
      )}
    </form>
  );
}
