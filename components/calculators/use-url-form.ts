"use client";

import { useEffect, useMemo, useRef } from "react";
import { useForm, useWatch, type DefaultValues, type FieldValues } from "react-hook-form";

export type SearchParamsRecord = Record<string, string | string[] | undefined>;

export type UrlCodec<V extends FieldValues> = {
  /** Reads form values from the page's query, falling back to the defaults for anything missing. */
  fromParams: (params: URLSearchParams, defaults: V) => V;
  toParams: (values: V) => URLSearchParams;
};

/** For calculators whose every field is one string: each field is one query parameter. */
export function flatCodec<V extends Record<string, string>>(): UrlCodec<V> {
  return {
    fromParams: (params, defaults) => {
      const values = { ...defaults };
      for (const key of Object.keys(defaults) as (keyof V & string)[]) {
        const value = params.get(key);
        if (value !== null && value.length <= 200) values[key] = value as V[typeof key];
      }
      return values;
    },
    toParams: (values) => new URLSearchParams(Object.entries(values)),
  };
}

export function toSearchParams(record: SearchParamsRecord | undefined): URLSearchParams {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(record ?? {})) {
    if (typeof value === "string") params.set(key, value);
    else if (Array.isArray(value) && value[0] !== undefined) params.set(key, value[0]);
  }
  return params;
}

/**
 * A calculator's form whose whole state lives in the address bar, so a layout can be
 * bookmarked and shared. The server page passes its searchParams in as `initial`, so the
 * first render already shows the shared layout. Embedded calculators (several on one lesson
 * page) pass `syncUrl: false` and keep their state to themselves.
 */
export function useUrlForm<V extends FieldValues>({
  defaults,
  initial,
  codec,
  syncUrl,
}: {
  defaults: V;
  initial?: SearchParamsRecord;
  codec: UrlCodec<V>;
  syncUrl: boolean;
}) {
  const startValues = useMemo(() => (syncUrl ? codec.fromParams(toSearchParams(initial), defaults) : defaults), []); // eslint-disable-line react-hooks/exhaustive-deps
  const form = useForm<V>({ defaultValues: startValues as DefaultValues<V>, mode: "onChange" });
  const values = useWatch({ control: form.control }) as V;
  const query = codec.toParams({ ...startValues, ...values }).toString();

  const first = useRef(true);
  useEffect(() => {
    if (!syncUrl) return;
    if (first.current) {
      first.current = false;
      return;
    }
    // replaceState, not a navigation: typing must not fill the back button's history.
    const url = `${window.location.pathname}?${query}`;
    window.history.replaceState(window.history.state, "", url);
  }, [query, syncUrl]);

  return { form, values: { ...startValues, ...values } as V, query };
}
