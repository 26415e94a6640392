import { useState } from 'react';
import type { z } from 'zod';
import { mergeFieldErrors } from '@/lib/ui/form-errors';
import { fieldErrors } from '@/shared/errors';
import { useSubmit } from './use-submit';

/**
 * A form's submit path: checks the values with the shared zod schema first (field messages at once, nothing
 * sent), then runs the action with the parsed value. `errors` holds the client's messages over the server's
 * 400 field messages; `error` is the API error the action failed with.
 */
export function useFormSubmit<T, R>(action: (value: T) => Promise<R>) {
  const { run, busy, error } = useSubmit(action);
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});

  /** Resolves to the action's result, or null when the values did not pass the schema. */
  const submit = async <S extends z.ZodType<T>>(schema: S, values: z.input<S>) => {
    const parsed = schema.safeParse(values);
    setClientErrors(parsed.success ? {} : fieldErrors(parsed.error));
    return parsed.success ? run(parsed.data) : null;
  };

  return { submit, busy, error, errors: mergeFieldErrors(clientErrors, error) };
}
