"use client";
import { type FieldErrors, type UseFormRegister, useFieldArray } from "react-hook-form";
import type { FormControl, FormValues } from "./formSchema";

/** The method as numbered steps; blank steps are dropped on save. */
export function StepsField({ control, register, errors }: { control: FormControl; register: UseFormRegister<FormValues>; errors: FieldErrors<FormValues> }) {
  const { fields, append, remove } = useFieldArray({ control, name: "steps" });
  return (
    <fieldset className="min-w-0">
      <legend className="field-label">Method</legend>
      <ol className="mt-2 space-y-2" data-testid="recipe-steps">
        {fields.map((f, i) => (
          <li key={f.id} className="flex items-start gap-2">
            <span className="mt-2.5 w-6 shrink-0 text-right text-sm font-semibold text-iron-500" aria-hidden="true">{i + 1}.</span>
            <div className="min-w-0 flex-1">
              <label className="sr-only" htmlFor={`step-${i}`}>Step {i + 1}</label>
              <textarea id={`step-${i}`} rows={2} className="field-input mt-0 text-sm" data-testid={`step-${i}`} placeholder={i === 0 ? "e.g. Warm the milk over a low heat." : undefined} {...register(`steps.${i}.text`)} />
              {errors.steps?.[i]?.text ? <p className="field-error text-xs">{errors.steps[i]?.text?.message}</p> : null}
            </div>
            {fields.length > 1 ? (
              <button type="button" className="mt-2 text-xs font-semibold text-ember-700 hover:underline" onClick={() => remove(i)}>
                Remove step {i + 1}
              </button>
            ) : null}
          </li>
        ))}
      </ol>
      {errors.steps?.message ? <p className="field-error">{errors.steps.message}</p> : null}
      {fields.length < 30 ? (
        <button type="button" className="btn-quiet mt-2 px-3 py-1.5" onClick={() => append({ text: "" })}>
          Add step
        </button>
      ) : null}
    </fieldset>
  );
}
