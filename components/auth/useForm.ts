import type { UseMutationResult } from '@tanstack/react-query';
import { useState } from 'react';
import type { z } from 'zod';
import { fieldErrors } from '@/shared/schemas/auth';
import { ApiError, ApiUnreachableError } from '../http/client';
import { placeFieldErrors, serverFieldErrors } from '../http/fieldErrors';

/** What went wrong with a form as a whole (not with one of its fields), to show above its button. */
export interface FormProblem {
  /** The server's error code (`bad_credentials`, `email_unverified`, `rate_limited` …), `unreachable`, or `invalid`. */
  code: string;
  status?: number;
  message: string;
}

interface UseFormOptions<K extends string, Body, Result> {
  /** The form's fields and what each starts with. */
  initial: Record<K, string>;
  /** The shared schema (shared/schemas/auth.ts) that the server checks the same body with. */
  schema: z.ZodType<Body>;
  /** The body the schema checks, from the typed values; the values themselves unless given. */
  body?: (values: Record<K, string>) => unknown;
  /** Checks only the form can make (the password typed twice), as messages by field. */
  check?: (values: Record<K, string>) => Partial<Record<K, string>>;
  mutation: Pick<UseMutationResult<Result, Error, Body>, 'mutate' | 'isPending'>;
  onSuccess?: (result: Result) => void;
  /** Empty the fields once the server has taken them (passwords). */
  clearOnSuccess?: boolean;
}

export interface FormState<K extends string, Result> {
  values: Record<K, string>;
  /** Props for the TextField of one field: its value, its error, Enter sends the form. */
  field: (name: K) => {
    name: K;
    value: string;
    onChangeText: (text: string) => void;
    onSubmitEditing: () => void;
    error?: string;
  };
  problem: FormProblem | null;
  submit: () => void;
  sending: boolean;
  /** The server's answer to the last send, until a field is changed again. */
  succeeded: Result | undefined;
}

/**
 * The problem a failed request is for a whole form (or for one button), in the server's words;
 * `leftover` are the server's field messages that no field of the form can show.
 */
export function problemOf(error: Error, leftover: string[] = []): FormProblem {
  if (error instanceof ApiUnreachableError) {
    return { code: 'unreachable', message: "Counterweight's server could not be reached. Check the connection, then try again." };
  }
  if (error instanceof ApiError) {
    // A validation failure's own message names fields by path; its field messages read better.
    const message = error.code === 'validation_failed' && leftover.length ? leftover.join(' ') : error.message;
    return { code: error.code, status: error.status, message };
  }
  return { code: 'failed', message: error.message };
}

/**
 * A form checked on the client with the same zod schema the server uses, before anything is
 * sent. Each field's message — from the schema or from the server's `fields` (`body.<field>`) —
 * stays beside its field; anything else (wrong password, rate limit, no answer) is the form's problem.
 */
export function useForm<K extends string, Body, Result>({
  initial,
  schema,
  body = (values) => values,
  check,
  mutation,
  onSuccess,
  clearOnSuccess = false,
}: UseFormOptions<K, Body, Result>): FormState<K, Result> {
  const names = Object.keys(initial) as K[];
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<Partial<Record<K, string>>>({});
  const [problem, setProblem] = useState<FormProblem | null>(null);
  const [succeeded, setSucceeded] = useState<Result | undefined>(undefined);

  const submit = () => {
    if (mutation.isPending) return;
    const parsed = schema.safeParse(body(values));
    const found = { ...(parsed.success ? {} : fieldErrors(parsed.error)), ...check?.(values) } as Record<string, string>;
    const { fields, leftover } = placeFieldErrors(names, found);
    setErrors(fields);
    setSucceeded(undefined);
    if (!parsed.success || Object.keys(found).length > 0) {
      setProblem(leftover.length ? { code: 'invalid', message: leftover.join(' ') } : null);
      return;
    }
    setProblem(null);
    mutation.mutate(parsed.data, {
      onSuccess: (result) => {
        if (clearOnSuccess) setValues(initial);
        setSucceeded(result);
        onSuccess?.(result);
      },
      onError: (error) => {
        const server = placeFieldErrors(names, serverFieldErrors(error));
        setErrors(server.fields);
        const placedAll = Object.keys(server.fields).length > 0 && server.leftover.length === 0;
        setProblem(placedAll ? null : problemOf(error, server.leftover));
      },
    });
  };

  const field = (name: K) => ({
    name,
    value: values[name],
    onChangeText: (text: string) => {
      setValues((current) => ({ ...current, [name]: text }));
      setErrors((current) => ({ ...current, [name]: undefined }));
      setSucceeded(undefined);
    },
    onSubmitEditing: submit,
    error: errors[name],
  });

  return { values, field, problem, submit, sending: mutation.isPending, succeeded };
}
