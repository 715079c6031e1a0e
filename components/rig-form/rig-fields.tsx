"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { Field, controlClasses } from "@/components/ui/field";
import { fieldKey, type RigFormValues } from "@/lib/rig-form/convert";
import type { ChoiceField, NumberField } from "@/lib/rig-form/fields";
import { displayOf } from "@/lib/rig-form/quantities";
import type { UnitSystem } from "@/lib/units";

type Errors = FieldErrors<RigFormValues>;

function errorAt(errors: Errors, path: string): string | undefined {
  const value = (errors.values as Record<string, { message?: string } | undefined> | undefined)?.[fieldKey(path)];
  return value?.message;
}

/** Number inputs in the user's units; the unit is part of the label. */
export function NumberFields({ fields, register, errors, units }: { fields: NumberField[]; register: UseFormRegister<RigFormValues>; errors: Errors; units: UnitSystem }) {
  return (
    <>
      {fields.map((f) => {
        const unit = displayOf(f.quantity, units).unit;
        const error = errorAt(errors, f.path);
        return (
          <Field key={f.path} label={`${f.label}${unit ? `, ${unit}` : ""}${f.optional ? " (optional)" : ""}`} hint={f.hint} error={error}>
            {(ids) => <input {...ids} inputMode="decimal" autoComplete="off" className={`${controlClasses(!!error)} h-10`} {...register(`values.${fieldKey(f.path)}`)} />}
          </Field>
        );
      })}
    </>
  );
}

export function ChoiceFields({ fields, register, errors }: { fields: ChoiceField[]; register: UseFormRegister<RigFormValues>; errors: Errors }) {
  return (
    <>
      {fields.map((f) => {
        const error = errorAt(errors, f.path);
        return (
          <Field key={f.path} label={f.label} hint={f.hint} error={error}>
            {(ids) => (
              <select {...ids} className={`${controlClasses(!!error)} h-10`} {...register(`values.${fieldKey(f.path)}`)}>
                {f.options.map(([value, label]) => (
                  <option key={value} value={value}>{label}</option>
                ))}
              </select>
            )}
          </Field>
        );
      })}
    </>
  );
}
