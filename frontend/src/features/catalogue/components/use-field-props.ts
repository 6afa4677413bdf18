import { get, useFormContext, type FieldError, type FieldValues, type Path } from 'react-hook-form';

import { numberOrNull, textOrNull } from '../utils/form-values';

/**
 * Registration plus the field's problem, ready to spread on a TextField, QuantityField or
 * SelectField inside a FormProvider. Converters only reshape text; the schema judges it.
 */
export function useFieldProps<T extends FieldValues>() {
  const {
    register,
    formState: { errors },
  } = useFormContext<T>();
  const errorOf = (name: string): string | undefined => {
    const found = get(errors, name) as (FieldError & { root?: FieldError }) | FieldError[] | undefined;
    if (!found) return undefined;
    if (Array.isArray(found)) return found.find((e) => e?.message)?.message;
    return found.message ?? found.root?.message;
  };
  return {
    errorOf,
    text: (name: Path<T>) => ({ ...register(name), error: errorOf(name) }),
    number: (name: Path<T>) => ({ ...register(name, { setValueAs: numberOrNull }), error: errorOf(name) }),
    optionalText: (name: Path<T>) => ({ ...register(name, { setValueAs: textOrNull }), error: errorOf(name) }),
  };
}
