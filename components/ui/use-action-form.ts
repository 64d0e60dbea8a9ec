"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";

import type { ActionResult } from "@/lib/shared/errors";

/**
 * react-hook-form + the zod schema the server action also uses. The browser check gives instant
 * messages; the server answer (which is what counts) is put beside its field, or above the form.
 */
export function useActionForm<S extends z.ZodType<FieldValues, FieldValues>, T>(
  schema: S,
  action: (values: z.output<S>) => Promise<ActionResult<T> | undefined>,
  options: { defaultValues?: DefaultValues<z.input<S>>; onSuccess?: (data: T) => void } = {},
) {
  const form = useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(schema),
    defaultValues: options.defaultValues,
  });
  const onSubmit = form.handleSubmit(async (values) => {
    let result: ActionResult<T> | undefined;
    try {
      result = await action(values);
    } catch {
      // Network failure or an action that redirected mid-flight without a result.
      form.setError("root", { message: "The request did not go through. Please try again." });
      return;
    }
    if (!result) return;
    if (result.ok) {
      options.onSuccess?.(result.data);
      return;
    }
    const field = result.field as Path<z.input<S>> | undefined;
    if (field && field in form.getValues())
      form.setError(field, { message: result.message }, { shouldFocus: true });
    else form.setError("root", { message: result.message });
  });
  return { form, onSubmit };
}
