"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useController, useForm, useWatch, type Control, type FieldError, type Path } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField } from "@/components/ui/form-field";
import { applyApiError } from "@/components/ui/api-errors";
import { createScenario, projectKeys, updateScenario, type Scenario } from "@/components/projects/queries";
import { displayText, parseDisplay, quantityUnit, rangeText, uValueUnit, type DisplayUnit } from "@/components/scenarios/display-units";
import { SURFACE_CLASSES, insideTemperatureC, type SurfaceKey } from "@/components/scenarios/surfaces";
import { scenarioInput, type ScenarioInput, type SurfaceThermal } from "@/lib/scenarios/schema";
import type { UnitSystem } from "@/lib/units";

type Values = ScenarioInput;

/** Every field path the server may name in a 400/409, so its errors land on the right input. */
const FIELD_PATHS: ReadonlyArray<Path<Values>> = [
  "name",
  "conditions.airTemperatureC",
  "conditions.relativeHumidityPercent",
  "conditions.airSpeedMps",
  "conditions.defaultClo",
  "conditions.defaultMet",
  "conditions.outdoorTemperatureC",
  "conditions.activeModes",
  ...SURFACE_CLASSES.flatMap((s) => [
    `conditions.surfaces.${s.key}` as Path<Values>,
    `conditions.surfaces.${s.key}.surfaceTemperatureC` as Path<Values>,
    `conditions.surfaces.${s.key}.uValueWm2K` as Path<Values>,
  ]),
];

/** Zod's messages name SI bounds; beside a converted field the hint gives the range in display units instead. */
function unitFieldMessage(error: FieldError | undefined): string | undefined {
  if (!error) return undefined;
  if (error.type === "too_small" || error.type === "too_big") return "outside the allowed range";
  if (error.type === "invalid_type") return "enter a number";
  return error.message;
}

function plainMessage(error: FieldError | undefined): string | undefined {
  if (!error) return undefined;
  return error.type === "invalid_type" ? "enter a number" : error.message;
}

/**
 * A number typed in display units and kept in SI. The text the user types is kept as typed; the
 * SI value goes to the form. (The form remounts on reset, so the text never needs syncing.)
 */
function UnitNumberField({
  control,
  name,
  label,
  unit,
  minSi,
  maxSi,
  extraHint,
}: {
  control: Control<Values>;
  name: Path<Values>;
  label: string;
  unit: DisplayUnit;
  minSi: number;
  maxSi: number;
  extraHint?: string;
}) {
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => displayText(unit, field.value as number));
  return (
    <FormField
      label={`${label} (${unit.symbol})`}
      inputMode="decimal"
      name={field.name}
      value={text}
      onBlur={field.onBlur}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(parseDisplay(unit, e.target.value));
      }}
      error={unitFieldMessage(fieldState.error)}
      hint={[rangeText(unit, minSi, maxSi), extraHint].filter(Boolean).join(" · ")}
    />
  );
}

const DEFAULT_THERMAL: Record<"surfaceTemperature" | "uValue", SurfaceThermal> = {
  surfaceTemperature: { kind: "surfaceTemperature", surfaceTemperatureC: 20 },
  uValue: { kind: "uValue", uValueWm2K: 0.3 },
};

function SurfaceRow({
  control,
  surface,
  system,
  onKind,
}: {
  control: Control<Values>;
  surface: (typeof SURFACE_CLASSES)[number];
  system: UnitSystem;
  onKind: (key: SurfaceKey, value: SurfaceThermal | null) => void;
}) {
  const thermal = useWatch({ control, name: `conditions.surfaces.${surface.key}` }) as SurfaceThermal | null;
  const airC = useWatch({ control, name: "conditions.airTemperatureC" });
  const outdoorC = useWatch({ control, name: "conditions.outdoorTemperatureC" });
  const temperature = quantityUnit("temperature", system);
  const kind = thermal === null ? "air" : thermal.kind;
  const selectId = `surface-${surface.key}-kind`;
  const inside = thermal?.kind === "uValue" ? insideTemperatureC(thermal, airC, outdoorC, surface.position) : Number.NaN;
  return (
    <fieldset className="grid gap-3 border-t border-line pt-3 sm:grid-cols-[12rem_1fr_1fr]">
      <legend className="sr-only">{surface.label}</legend>
      <div className="space-y-1">
        <label htmlFor={selectId} className="block text-sm font-medium">
          {surface.label}
        </label>
        <select
          id={selectId}
          className="block w-full rounded-md border border-line bg-white px-2 py-2 text-sm"
          value={kind}
          onChange={(e) => {
            const next = e.target.value;
            onKind(surface.key, next === "air" ? null : DEFAULT_THERMAL[next as "surfaceTemperature" | "uValue"]);
          }}
        >
          {surface.nullable ? <option value="air">At the air temperature</option> : null}
          <option value="surfaceTemperature">Surface temperature</option>
          <option value="uValue">U-value</option>
        </select>
      </div>
      {thermal?.kind === "surfaceTemperature" ? (
        <UnitNumberField
          key={`${surface.key}-t`}
          control={control}
          name={`conditions.surfaces.${surface.key}.surfaceTemperatureC` as Path<Values>}
          label={`${surface.label}: surface temperature`}
          unit={temperature}
          minSi={-30}
          maxSi={80}
        />
      ) : thermal?.kind === "uValue" ? (
        <>
          <UnitNumberField
            key={`${surface.key}-u`}
            control={control}
            name={`conditions.surfaces.${surface.key}.uValueWm2K` as Path<Values>}
            label={`${surface.label}: U-value`}
            unit={uValueUnit(system)}
            minSi={0.05}
            maxSi={10}
          />
          <p className="self-center text-sm" aria-live="polite">
            Inside surface:{" "}
            <strong className="font-mono">{Number.isFinite(inside) ? `${displayText(temperature, inside)} ${temperature.symbol}` : "—"}</strong>
            <span className="block text-xs text-muted">ISO 6946 inside surface resistance, far side at the outdoor temperature</span>
          </p>
        </>
      ) : (
        <p className="self-center text-sm text-muted">Same as the room air.</p>
      )}
    </fieldset>
  );
}

/**
 * Create or edit one scenario. The form holds SI values and validates with the server's own
 * schema (lib/scenarios/schema.ts); temperatures, speeds and U-values are typed in the
 * member's units. Read-only without scenarios:write.
 */
export function ScenarioForm({
  projectId,
  scenario,
  initial,
  system,
  canWrite,
  onSaved,
}: {
  projectId: string;
  /** null = a new scenario. */
  scenario: Scenario | null;
  initial: ScenarioInput;
  system: UnitSystem;
  canWrite: boolean;
  onSaved: (saved: Scenario) => void;
}) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(scenarioInput), defaultValues: initial, mode: "onTouched" });
  const { errors } = form.formState;
  const save = useMutation({
    mutationFn: (values: Values) => (scenario ? updateScenario(projectId, scenario.id, values) : createScenario(projectId, values)),
    onSuccess: async (saved) => {
      setMessage({ tone: "success", text: `Saved “${saved.name}”.` });
      // New or changed conditions: the list and every cached result of this project's scenarios.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: projectKeys.scenarios(projectId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.compute(projectId) }),
      ]);
      onSaved(saved);
    },
    onError: (error) => setMessage({ tone: "error", text: applyApiError(error, form.setError, FIELD_PATHS) }),
  });
  const temperature = quantityUnit("temperature", system);
  const speed = quantityUnit("speed", system, system === "si" ? 2 : 0);
  const modes = useWatch({ control: form.control, name: "conditions.activeModes" });

  function toggleMode(mode: "heating" | "cooling", on: boolean) {
    const next = on ? [...modes.filter((m) => m !== mode), mode] : modes.filter((m) => m !== mode);
    form.setValue("conditions.activeModes", next, { shouldDirty: true, shouldValidate: true });
  }

  return (
    <form
      noValidate
      aria-label={scenario ? `Edit scenario ${scenario.name}` : "New scenario"}
      className="space-y-6"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        save.mutate(values);
      })}
    >
      <fieldset disabled={!canWrite || save.isPending} className="space-y-6">
        <FormField label="Scenario name" error={errors.name?.message} {...form.register("name")} />

        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <UnitNumberField control={form.control} name="conditions.airTemperatureC" label="Air temperature" unit={temperature} minSi={5} maxSi={40} />
          <FormField
            label="Relative humidity (%)"
            inputMode="decimal"
            hint="0 – 100 %"
            error={plainMessage(errors.conditions?.relativeHumidityPercent)}
            {...form.register("conditions.relativeHumidityPercent", { valueAsNumber: true })}
          />
          <UnitNumberField control={form.control} name="conditions.airSpeedMps" label="Air speed" unit={speed} minSi={0} maxSi={2} />
          <FormField
            label="Default clothing (clo)"
            inputMode="decimal"
            hint="0 – 2 clo, for seats without their own"
            error={plainMessage(errors.conditions?.defaultClo)}
            {...form.register("conditions.defaultClo", { valueAsNumber: true })}
          />
          <FormField
            label="Default activity (met)"
            inputMode="decimal"
            hint="0.8 – 4 met, for seats without their own"
            error={plainMessage(errors.conditions?.defaultMet)}
            {...form.register("conditions.defaultMet", { valueAsNumber: true })}
          />
          <UnitNumberField
            control={form.control}
            name="conditions.outdoorTemperatureC"
            label="Outdoor temperature"
            unit={temperature}
            minSi={-50}
            maxSi={55}
            extraHint="far side of surfaces given by U-value"
          />
        </div>

        <fieldset className="space-y-2">
          <legend className="text-sm font-medium">Active panel modes</legend>
          <div className="flex gap-6 text-sm">
            {(["heating", "cooling"] as const).map((mode) => (
              <label key={mode} className="flex items-center gap-2">
                <input type="checkbox" checked={modes.includes(mode)} onChange={(e) => toggleMode(mode, e.target.checked)} />
                {mode === "heating" ? "Heating panels run" : "Cooling panels run"}
              </label>
            ))}
          </div>
          <p className="text-xs text-muted">Panels of a mode that does not run sit at the temperature of the surface they are mounted on.</p>
          <p aria-live="polite" className="text-sm text-danger">
            {errors.conditions?.activeModes?.message ?? errors.conditions?.activeModes?.root?.message}
          </p>
        </fieldset>

        <fieldset className="space-y-3">
          <legend className="text-sm font-medium">Room surfaces</legend>
          <p className="text-xs text-muted">
            Enter each class of surface as a surface temperature, or as a U-value: the inside surface temperature then follows from the air and
            outdoor temperatures with the ISO 6946 inside surface resistance. Openings with their own data in the layout keep it.
          </p>
          {SURFACE_CLASSES.map((surface) => (
            <SurfaceRow
              key={surface.key}
              control={form.control}
              surface={surface}
              system={system}
              onKind={(key, value) =>
                form.setValue(`conditions.surfaces.${key}`, value as never, { shouldDirty: true, shouldValidate: form.formState.isSubmitted })
              }
            />
          ))}
        </fieldset>
      </fieldset>

      <FormAlert tone={message?.tone ?? "error"}>{message?.text}</FormAlert>
      {canWrite ? (
        <Button type="submit" pending={save.isPending}>
          {scenario ? "Save scenario" : "Create scenario"}
        </Button>
      ) : (
        <p className="text-sm text-muted">Your role can read scenarios; designers and admins edit them.</p>
      )}
    </form>
  );
}
