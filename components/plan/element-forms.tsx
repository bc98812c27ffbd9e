"use client";

/**
 * The properties forms, one per element kind. Values, unit conversion and the schemas (each the
 * element's own zod schema from lib/layout/schema behind a unit conversion) live in
 * lib/plan/forms; these components only lay out the inputs.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import { useCallback, useEffect, useMemo, useRef, type ReactNode } from "react";
import { useForm, type DefaultValues, type FieldErrors, type FieldValues, type Path, type Resolver, type UseFormRegister } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormField, SelectField } from "@/components/ui/form-field";
import type { Opening, Panel, Room, Seat, Zone } from "@/lib/layout/schema";
import {
  openingFormSchema, openingToForm, panelFormSchema, panelToForm, roomFormSchema, roomToForm, seatFormSchema, seatToForm, zoneFormSchema, zoneToForm,
  type OpeningForm, type PanelForm, type RoomForm, type SeatForm, type ZoneForm,
} from "@/lib/plan/forms";
import { unitSymbol, type UnitSystem } from "@/lib/units";
import { asNumber, asNumberOrNull, errorAt } from "@/components/ui/form-values";

interface NumberProps<F extends FieldValues> {
  name: Path<F>;
  label: string;
  register: UseFormRegister<F>;
  errors: FieldErrors<F>;
  unit?: string;
  optional?: boolean;
  hint?: ReactNode;
  step?: string;
}

function NumberInput<F extends FieldValues>({ name, label, register, errors, unit, optional, hint, step = "any" }: NumberProps<F>) {
  return (
    <FormField
      label={unit ? `${label} (${unit})` : label}
      type="number"
      step={step}
      inputMode="decimal"
      hint={hint}
      error={errorAt(errors, name)}
      {...register(name, { setValueAs: optional ? asNumberOrNull : asNumber })}
    />
  );
}

function TextInput<F extends FieldValues>({ name, label, register, errors }: { name: Path<F>; label: string; register: UseFormRegister<F>; errors: FieldErrors<F> }) {
  return <FormField label={label} error={errorAt(errors, name)} {...register(name)} />;
}

function FormShell({ title, children, onSubmit, readOnly, formError }: { title: string; children: ReactNode; onSubmit: () => void; readOnly: boolean; formError?: string }) {
  return (
    <form
      noValidate
      aria-label={title}
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
      className="space-y-3"
    >
      <fieldset disabled={readOnly} className="space-y-3">
        {children}
      </fieldset>
      <div aria-live="polite" className="text-sm text-danger">
        {formError}
      </div>
      {readOnly ? null : (
        <Button type="submit" className="w-full">
          Apply
        </Button>
      )}
    </form>
  );
}

function useElementForm<F extends FieldValues, E>(schema: z.ZodType<E, F>, defaults: F) {
  // The schema closes over the element (its id, outline, room); read the latest one at submit
  // time, since the element can change while the form stays open (a drag, an undo).
  const latestSchema = useRef(schema);
  useEffect(() => {
    latestSchema.current = schema;
  }, [schema]);
  const resolver = useCallback<Resolver<F, unknown, E>>(
    (values, context, options) => (zodResolver(latestSchema.current as never) as unknown as Resolver<F, unknown, E>)(values, context, options),
    [],
  );
  const form = useForm<F, unknown, E>({ resolver, defaultValues: defaults as DefaultValues<F>, mode: "onSubmit" });
  const { reset } = form;
  const key = JSON.stringify(defaults);
  // Show the element's new values when it changes under the form.
  useEffect(() => {
    reset(JSON.parse(key) as F);
  }, [key, reset]);
  return form;
}

interface FormProps<T> {
  element: T;
  units: UnitSystem;
  readOnly: boolean;
  onApply: (next: T) => void;
}

// ---------- rooms ----------
export function RoomProperties({ element, units, readOnly, onApply }: FormProps<Room>) {
  const schema = useMemo(() => roomFormSchema(element, units), [element, units]);
  const { register, handleSubmit, formState } = useElementForm<RoomForm, Room>(schema, roomToForm(element, units));
  const e = formState.errors;
  return (
    <FormShell title="Room properties" readOnly={readOnly} onSubmit={handleSubmit(onApply)}>
      <TextInput name="name" label="Room name" register={register} errors={e} />
      <NumberInput name="ceilingHeightM" label="Ceiling height" unit={unitSymbol("length", units)} register={register} errors={e} />
    </FormShell>
  );
}

// ---------- openings ----------
export function OpeningProperties({ element, room, units, readOnly, onApply }: FormProps<Opening> & { room: Room | undefined }) {
  const schema = useMemo(() => openingFormSchema(element, units), [element, units]);
  const { register, handleSubmit, formState, watch } = useElementForm<OpeningForm, Opening>(schema, openingToForm(element, units));
  const e = formState.errors;
  const thermalKind = watch("thermal.kind");
  const lengthUnit = unitSymbol("length", units);
  const edges = (room?.outline ?? []).map((_, i) => ({ value: String(i), label: `Edge ${i + 1} (corner ${i + 1} → ${((i + 1) % (room?.outline.length ?? 1)) + 1})` }));
  return (
    <FormShell title="Opening properties" readOnly={readOnly} onSubmit={handleSubmit(onApply)}>
      <SelectField label="Opening kind" options={[{ value: "window", label: "Window" }, { value: "glazedDoor", label: "Glazed door" }]} error={errorAt(e, "kind")} {...register("kind")} />
      <SelectField label="Room edge" options={edges} error={errorAt(e, "edgeIndex")} {...register("edgeIndex")} />
      <NumberInput name="offsetM" label="Offset along the edge" unit={lengthUnit} register={register} errors={e} />
      <NumberInput name="widthM" label="Opening width" unit={lengthUnit} register={register} errors={e} />
      <NumberInput name="sillHeightM" label="Sill height" unit={lengthUnit} register={register} errors={e} />
      <NumberInput name="heightM" label="Opening height" unit={lengthUnit} register={register} errors={e} />
      <SelectField
        label="Inside surface known by"
        options={[{ value: "uValue", label: "U-value" }, { value: "surfaceTemperature", label: "Surface temperature" }]}
        {...register("thermal.kind")}
      />
      {thermalKind === "uValue" ? (
        <NumberInput name="thermal.uValueWm2K" label="U-value" unit="W/(m²·K)" register={register} errors={e} optional />
      ) : (
        <NumberInput name="thermal.surfaceTemperatureC" label="Surface temperature" unit={unitSymbol("temperature", units)} register={register} errors={e} optional />
      )}
    </FormShell>
  );
}

// ---------- panels ----------
export function PanelProperties({ element, units, readOnly, onApply }: FormProps<Panel>) {
  const schema = useMemo(() => panelFormSchema(element, units), [element, units]);
  const { register, handleSubmit, formState, watch } = useElementForm<PanelForm, Panel>(schema, panelToForm(element, units));
  const e = formState.errors;
  const [supplyKind, louverOn, mounting] = watch(["supply.kind", "louverOn", "mounting"]);
  const lengthUnit = unitSymbol("length", units);
  const tempUnit = unitSymbol("temperature", units);
  return (
    <FormShell title="Panel properties" readOnly={readOnly} onSubmit={handleSubmit(onApply)}>
      <TextInput name="label" label="Panel label" register={register} errors={e} />
      <SelectField label="Mounting" options={[{ value: "ceiling", label: "Ceiling" }, { value: "wall", label: "Wall" }]} {...register("mounting")} />
      <SelectField label="Mode" options={[{ value: "heating", label: "Heating" }, { value: "cooling", label: "Cooling" }]} {...register("mode")} />
      <div className="grid grid-cols-2 gap-2">
        <NumberInput name="widthM" label={mounting === "wall" ? "Height" : "Width"} unit={lengthUnit} register={register} errors={e} />
        <NumberInput name="lengthM" label="Length" unit={lengthUnit} register={register} errors={e} />
      </div>
      <NumberInput
        name="mountingHeightM"
        label={mounting === "wall" ? "Lower edge height" : "Mounting height"}
        unit={lengthUnit}
        optional
        hint={mounting === "wall" ? undefined : "Blank = the room's ceiling height."}
        register={register}
        errors={e}
      />
      <div className="grid grid-cols-2 gap-2">
        <NumberInput name="center.x" label="Centre x" unit={lengthUnit} register={register} errors={e} />
        <NumberInput name="center.y" label="Centre y" unit={lengthUnit} register={register} errors={e} />
      </div>
      <NumberInput name="rotationDeg" label={mounting === "wall" ? "Facing direction" : "Rotation"} unit="°" register={register} errors={e} />
      <SelectField
        label="Temperature set by"
        options={[{ value: "surface", label: "Surface temperature" }, { value: "water", label: "Mean water temperature" }]}
        {...register("supply.kind")}
      />
      {supplyKind === "surface" ? (
        <NumberInput name="supply.surfaceTemperatureC" label="Surface temperature" unit={tempUnit} optional register={register} errors={e} />
      ) : (
        <>
          <NumberInput name="supply.meanWaterTemperatureC" label="Mean water temperature" unit={tempUnit} optional register={register} errors={e} />
          <div className="grid grid-cols-2 gap-2">
            <NumberInput name="supply.characteristic.kWm2PerKn" label="Characteristic K" unit="W/(m²·Kⁿ)" optional register={register} errors={e} />
            <NumberInput name="supply.characteristic.n" label="Exponent n" optional register={register} errors={e} />
          </div>
        </>
      )}
      <NumberInput name="emissivity" label="Surface emissivity" register={register} errors={e} />
      <label className="flex items-center gap-2 text-sm font-medium">
        <input type="checkbox" {...register("louverOn")} /> Louver cavities
      </label>
      {louverOn ? (
        <div className="space-y-3 rounded-md border border-line p-3">
          <NumberInput name="louver.openingAngleDeg" label="Opening angle" unit="°, 0–180" register={register} errors={e} />
          <div className="grid grid-cols-2 gap-2">
            <NumberInput name="louver.minOpeningAngleDeg" label="Least angle" unit="°" register={register} errors={e} />
            <NumberInput name="louver.maxOpeningAngleDeg" label="Greatest angle" unit="°" register={register} errors={e} />
          </div>
          <NumberInput name="louver.axisDeg" label="Louver axis direction" unit="°" register={register} errors={e} />
          <SelectField label="Cavity finish" options={[{ value: "diffuse", label: "Diffuse" }, { value: "specular", label: "Specular" }]} {...register("louver.finish")} />
          <NumberInput name="louver.wallEmissivity" label="Cavity wall emissivity" register={register} errors={e} />
        </div>
      ) : null}
      <p className="text-xs text-muted">
        Caution: a hot panel within reach can burn and a chilled panel at or below the dew point can drip. Mounting, electrical and hydraulic
        connections follow the manufacturer&apos;s instructions, local codes and licensed practice.
      </p>
    </FormShell>
  );
}

// ---------- seats ----------
export function SeatProperties({ element, units, readOnly, onApply }: FormProps<Seat>) {
  const schema = useMemo(() => seatFormSchema(element, units), [element, units]);
  const { register, handleSubmit, formState } = useElementForm<SeatForm, Seat>(schema, seatToForm(element, units));
  const e = formState.errors;
  const lengthUnit = unitSymbol("length", units);
  return (
    <FormShell title="Seat properties" readOnly={readOnly} onSubmit={handleSubmit(onApply)}>
      <TextInput name="label" label="Seat label" register={register} errors={e} />
      <SelectField label="Posture" options={[{ value: "seated", label: "Seated" }, { value: "standing", label: "Standing" }]} {...register("posture")} />
      <NumberInput name="facingDeg" label="Facing" unit="°" register={register} errors={e} />
      <div className="grid grid-cols-2 gap-2">
        <NumberInput name="position.x" label="Position x" unit={lengthUnit} register={register} errors={e} />
        <NumberInput name="position.y" label="Position y" unit={lengthUnit} register={register} errors={e} />
      </div>
      <NumberInput name="clo" label="Clothing" unit="clo" optional hint="Blank = the scenario's default." register={register} errors={e} />
      <NumberInput name="met" label="Activity" unit="met" optional hint="Blank = the scenario's default." register={register} errors={e} />
    </FormShell>
  );
}

// ---------- zones ----------
export function ZoneProperties({ element, readOnly, onApply }: FormProps<Zone>) {
  const schema = useMemo(() => zoneFormSchema(element), [element]);
  const { register, handleSubmit, formState, watch } = useElementForm<ZoneForm, Zone>(schema, zoneToForm(element));
  const e = formState.errors;
  const kind = watch("target.kind");
  return (
    <FormShell title="Zone properties" readOnly={readOnly} onSubmit={handleSubmit(onApply)}>
      <TextInput name="name" label="Zone name" register={register} errors={e} />
      <SelectField label="Comfort target" options={[{ value: "pmvBand", label: "PMV band" }, { value: "category", label: "ISO 7730 category" }]} {...register("target.kind")} />
      {kind === "pmvBand" ? (
        <div className="grid grid-cols-2 gap-2">
          <NumberInput name="target.minPmv" label="Lowest PMV" register={register} errors={e} />
          <NumberInput name="target.maxPmv" label="Highest PMV" register={register} errors={e} />
        </div>
      ) : (
        <SelectField label="Category" options={["A", "B", "C"].map((c) => ({ value: c, label: `Category ${c}` }))} {...register("target.category")} />
      )}
    </FormShell>
  );
}
