'use client';
// react-hook-form with the sheet's zod schema, reporting every change upward so the result
// updates as the user types (no submit button).
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Resolver, type UseFormReturn } from 'react-hook-form';
import { errorFor, type FieldError } from '@/lib/workbench/field-error';
import type * as z from '@/lib/validation/zod-mini';
import { markInput } from './perf-marks';

export function useLiveForm<T extends FieldValues>(schema: z.ZodMiniType<T>, defaults: T, onChange: (v: T) => void) {
  const form = useForm<T>({ resolver: zodResolver(schema as never) as unknown as Resolver<T>, mode: 'onChange', defaultValues: defaults as DefaultValues<T> });
  const latest = useRef(onChange);
  useEffect(() => {
    latest.current = onChange;
  }, [onChange]);
  useEffect(() => {
    const sub = form.watch((v) => {
      markInput();
      latest.current(v as T);
    });
    return () => sub.unsubscribe();
  }, [form]);
  return form;
}

const blank = (v: unknown) => v === undefined || v === null || (typeof v === 'string' && v.trim() === '');

/**
 * What to say under each top-level field: react-hook-form's own message, else the sheet build's —
 * except for a field still blank that the user has not touched. A new sheet so opens without red
 * "required" messages (each field's hint says what to type), and a field's message appears once the
 * user has been there. `waiting` is true when every build message is held back that way, so the
 * result panel can say how to begin instead of pointing at messages that are not shown.
 */
export function useFieldMessages<T extends FieldValues>(form: UseFormReturn<T>, buildErrors: readonly FieldError[]) {
  const { formState } = form;
  const values = form.watch() as Record<string, unknown>;
  const own = formState.errors as Record<string, { message?: string } | undefined>;
  const touched = formState.touchedFields as Record<string, unknown>;
  const held = (field: string) => {
    const top = field.split('.')[0]!;
    return top in values && blank(values[top]) && !touched[top] && !own[top];
  };
  return {
    err: (field: string) => own[field]?.message ?? (held(field) ? undefined : errorFor(buildErrors, field)),
    waiting: buildErrors.length > 0 && buildErrors.every((e) => held(e.field)),
  };
}
