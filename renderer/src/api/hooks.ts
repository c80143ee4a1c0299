import { useCallback, useEffect, useRef, useState } from 'react';
import type { OperationInput, OperationName, OperationOutput } from '../../../shared-model/api/contract';
import type { ApiError } from '../../../shared-model/api/result';
import { call } from './client';

export interface QueryState<T> {
  data: T | null;
  error: ApiError | null;
  loading: boolean;
  /** The `key` the shown data (or error) was loaded for: stale while it differs from the key passed now. */
  loadedKey: string | null;
  reload: () => void;
}

/** Runs a query operation whenever `key` changes (pass a stable string built from the input). */
export function useQuery<Name extends OperationName>(
  name: Name,
  input: OperationInput<Name> | null,
  key: string,
): QueryState<OperationOutput<Name>> {
  const [data, setData] = useState<OperationOutput<Name> | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [loading, setLoading] = useState(false);
  const [loadedKey, setLoadedKey] = useState<string | null>(null);
  const [tick, setTick] = useState(0);
  const inputRef = useRef(input);
  inputRef.current = input;
  useEffect(() => {
    const current = inputRef.current;
    if (current === null) {
      setData(null);
      return;
    }
    let live = true;
    setLoading(true);
    call(name, current).then(
      (result) => {
        if (!live) return;
        setLoading(false);
        setLoadedKey(key);
        if (result.ok) {
          setData(result.value);
          setError(null);
        } else setError(result.error);
      },
      (failure: unknown) => {
        if (!live) return;
        setLoading(false);
        setLoadedKey(key);
        setError({ code: 'internal', message: String(failure) });
      },
    );
    return () => {
      live = false;
    };
  }, [name, key, tick]);
  const reload = useCallback(() => setTick((value) => value + 1), []);
  return { data, error, loading, loadedKey, reload };
}

/**
 * The input an error's dotted field belongs to: an alias for the whole path, else for its longest aliased
 * prefix ("pair.elementB" → alias of "pair" when only that is given), else the path itself.
 */
export function inputForField(field: string, fieldAliases: Record<string, string> = {}): string {
  const parts = field.split('.');
  for (let n = parts.length; n > 0; n--) {
    const alias = fieldAliases[parts.slice(0, n).join('.')];
    if (alias !== undefined) return alias;
  }
  return field;
}

/** Field-level errors from an API error: `errors.name` holds the message for the input named "name". */
export function useFieldErrors(): {
  errors: Record<string, string>;
  general: string | null;
  show: (error: ApiError, fieldAliases?: Record<string, string>) => void;
  clear: () => void;
} {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState<string | null>(null);
  const show = useCallback((error: ApiError, fieldAliases: Record<string, string> = {}) => {
    const field = error.field ? inputForField(error.field, fieldAliases) : null;
    if (field) {
      setErrors({ [field]: error.message });
      setGeneral(null);
    } else {
      setErrors({});
      setGeneral(error.message);
    }
  }, []);
  const clear = useCallback(() => {
    setErrors({});
    setGeneral(null);
  }, []);
  return { errors, general, show, clear };
}
