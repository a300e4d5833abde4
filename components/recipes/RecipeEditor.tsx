"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { type FieldPath, type Resolver, useFieldArray, useForm } from "react-hook-form";
import type { RecipeJson, RecipeResponse } from "@/app/api/recipes/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { INGREDIENTS_MAX } from "@/lib/nutrition";
import { blankIngredient, type FormOutput, type FormValues, formValuesOf, recipeFormSchema, toPayload } from "./formSchema";
import { IngredientRow } from "./IngredientRow";
import { PerServingBar, PerServingPanel } from "./PerServingPanel";
import { StepsField } from "./StepsField";

/**
 * Writes a recipe: title, servings, ingredients (a repeatable list) and the
 * method, with the per-serving panel beside it updating as the coach types.
 * A new recipe is created on the first save; server refusals land on the
 * field at fault and nothing typed is lost.
 */
export function RecipeEditor({ recipe }: { recipe: RecipeJson | null }) {
  const router = useRouter();
  const [status, setStatus] = useState<string | null>(null);
  const form = useForm<FormValues, unknown, FormOutput>({
    resolver: zodResolver(recipeFormSchema) as unknown as Resolver<FormValues, unknown, FormOutput>,
    defaultValues: formValuesOf(recipe),
    // Missing values are reported on save; impossible ones show as they are typed (IngredientRow).
    mode: "onSubmit",
  });
  const { control, register, formState } = form;
  const { errors, isSubmitting } = formState;
  const ingredients = useFieldArray({ control, name: "ingredients" });

  async function submit(out: FormOutput) {
    setStatus(null);
    try {
      const json = toPayload(out);
      if (recipe) {
        await api<RecipeResponse>(`/api/recipes/${recipe.id}`, { method: "PUT", json });
        setStatus("Saved.");
        router.refresh();
      } else {
        const created = await api<RecipeResponse>("/api/recipes", { method: "POST", json });
        router.push(`/coach/recipes/${created.recipe.id}`);
      }
    } catch (e) {
      if (e instanceof ApiFailure) {
        for (const [field, message] of Object.entries(e.error.fields)) {
          // The server names steps by position in the list it kept; the form's rows carry `.text`.
          const path = /^steps\.\d+$/.test(field) ? `${field}.text` : field;
          form.setError(path as FieldPath<FormValues>, { message });
        }
      }
      setStatus(describeFailure(e));
    }
  }

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]" data-testid="recipe-editor">
      <div className="space-y-6">
        <div className="panel grid grid-cols-1 gap-4 p-4 sm:grid-cols-[minmax(0,1fr)_8rem]">
          <div>
            <label className="field-label" htmlFor="recipe-title">Title</label>
            <input id="recipe-title" className="field-input" autoComplete="off" placeholder="e.g. Overnight oats" aria-invalid={!!errors.title} {...register("title")} />
            {errors.title ? <p className="field-error">{errors.title.message}</p> : null}
          </div>
          <div>
            <label className="field-label" htmlFor="recipe-servings">Servings</label>
            <input id="recipe-servings" type="number" inputMode="numeric" min={1} max={100} step={1} className="field-input" aria-invalid={!!errors.servings} {...register("servings", { valueAsNumber: true })} />
            {errors.servings ? <p className="field-error">{errors.servings.message}</p> : null}
          </div>
        </div>

        <fieldset className="panel min-w-0 p-4">
          <legend className="sr-only">Ingredients</legend>
          <h2 className="text-sm font-semibold uppercase tracking-wider text-iron-400" aria-hidden="true">Ingredients</h2>
          <p className="mt-1 text-sm text-iron-500">
            Copy the values per 100 g from each label. Amounts in ml need the density; amounts in pieces need the weight of one. Carbohydrate is without
            fibre, as EU labels print it; where a label&apos;s carbohydrate includes fibre, leave fibre empty.
          </p>
          <ul className="mt-3 space-y-3" data-testid="ingredient-list">
            {ingredients.fields.map((f, i) => (
              <IngredientRow key={f.id} index={i} control={control} register={register} errors={errors} onRemove={ingredients.fields.length > 1 ? () => ingredients.remove(i) : null} />
            ))}
          </ul>
          {errors.ingredients?.message || errors.ingredients?.root?.message ? (
            <p className="field-error">{errors.ingredients.message ?? errors.ingredients.root?.message}</p>
          ) : null}
          {ingredients.fields.length < INGREDIENTS_MAX ? (
            <button type="button" className="btn-quiet mt-3 px-3 py-1.5" onClick={() => ingredients.append(blankIngredient())}>
              Add ingredient
            </button>
          ) : null}
        </fieldset>

        <div className="panel p-4">
          <StepsField control={control} register={register} errors={errors} />
        </div>

        <div className="flex flex-wrap items-center gap-3">
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? "Saving…" : recipe ? "Save changes" : "Save recipe"}
          </button>
          {status ? <p role="status" className="text-sm text-iron-600">{status}</p> : null}
        </div>
        <PerServingBar control={control} />
      </div>
      <div className="lg:sticky lg:top-4 lg:self-start">
        <PerServingPanel control={control} />
      </div>
    </form>
  );
}
