'use client';
// react-hook-form with the sheet's zod schema, reporting every change upward so the result
// updates as the user types (no submit button).
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Resolver } from 'react-hook-form';
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
