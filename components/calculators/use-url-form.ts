"use client";

import { useCallback, useEffect, useMemo, useRef } from "react";
import { get, useForm, useWatch, type DefaultValues, type FieldValues, type Path, type PathValue, type RegisterOptions, type UseFormReturn } from "react-hook-form";

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
  const rhf = useForm<V>({ defaultValues: startValues as DefaultValues<V>, mode: "onChange" });
  const { register: registerField, setValue, getValues } = rhf;

  // Ref callbacks of the page's first commit run before its effects: until then a field being
  // registered is one the server drew, which a visitor may already have typed into.
  const hydrating = useRef(true);
  const typedBeforeHydration = useRef<[Path<V>, string][]>([]);

  // Every field carries its starting value into the server's HTML, so the page reads right (and
  // can be typed into) before it hydrates, and no field needs disabling until then.
  // react-hook-form writes its default into each field as it registers it; whatever the visitor
  // typed or picked in the meantime is put back into the box at once, and into the form's values
  // once the form is listening (below).
  const register = useCallback(
    <N extends Path<V>>(name: N, options?: RegisterOptions<V, N>) => {
      const registration = registerField(name, options);
      const keepWhatWasTyped = (element: HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement | null) => {
        if (!element || !hydrating.current) return registration.ref(element);
        if (element instanceof HTMLInputElement && element.type === "radio") {
          // Registering one button of a group checks the default and so unchecks the one picked.
          const group = (element.form ?? element.ownerDocument).querySelectorAll<HTMLInputElement>(`input[type="radio"][name="${CSS.escape(element.name)}"]`);
          const picked = [...group].find((button) => button.checked)?.value;
          registration.ref(element);
          if (picked !== undefined && picked !== getValues(name)) typedBeforeHydration.current.push([name, picked]);
          return;
        }
        const typed = element.value;
        registration.ref(element);
        if (typed === element.value) return;
        element.value = typed;
        typedBeforeHydration.current.push([name, typed]);
      };
      // A path ("pieces.2.length") reaches into the field arrays; rows added later have no start value.
      const start: unknown = get(startValues, name);
      return { ...registration, ref: keepWhatWasTyped, defaultValue: typeof start === "string" ? start : undefined };
    },
    [registerField, getValues, startValues],
  );
  /** A radio button of a field: checked in the server's HTML when it is the starting value. */
  const choice = useCallback(
    <N extends Path<V>>(name: N, value: string, options?: RegisterOptions<V, N>) => {
      const { defaultValue, ...registration } = register(name, options);
      return { ...registration, value, defaultChecked: defaultValue === value };
    },
    [register],
  );
  const form: UseFormReturn<V> = { ...rhf, register };
  const watched = useWatch({ control: form.control }) as V;
  // After useWatch has subscribed, so the values, the results and the address follow.
  useEffect(() => {
    hydrating.current = false;
    for (const [name, value] of typedBeforeHydration.current) setValue(name, value as PathValue<V, Path<V>>, { shouldDirty: true });
    typedBeforeHydration.current = [];
  }, [setValue]);
  const current = { ...startValues, ...watched } as V;
  const query = codec.toParams(current).toString();
  // One object for as long as the query is the same, so what a calculator derives from its values
  // (the parse, the layout, the results) is not made again by a render that changed nothing:
  // react-hook-form renders once more as it mounts.
  const values = useMemo(() => current, [query]); // eslint-disable-line react-hooks/exhaustive-deps

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

  return { form, choice, values, query };
}
