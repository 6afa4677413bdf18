import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { RecipeInputSchema, type RecipeDetail } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useCreateRecipe } from '../api/create-recipe';

const EMPTY = { code: '', name: '', product: '', notes: '' };

type NewRecipeFormProps = { onCreated: (recipe: RecipeDetail) => void; onCancel: () => void };

/** Names a new recipe; the server starts it with an empty draft, version 1. */
export function NewRecipeForm({ onCreated, onCancel }: NewRecipeFormProps) {
  const create = useCreateRecipe();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(RecipeInputSchema), defaultValues: EMPTY });

  const onSubmit = handleSubmit((input) =>
    create.mutate(input, {
      onSuccess: onCreated,
      onError: (error) => {
        // 409: another recipe already has this code; the person changes the code.
        if (isApiError(error, 409)) setError('code', { type: 'server', message: error.message });
        else applyApiErrorToForm(error, setError, ['code', 'name', 'product', 'notes']);
      },
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="new-recipe-title" className="flex max-w-md flex-col gap-5">
      <h2 id="new-recipe-title" className="text-xl font-bold">
        New recipe
      </h2>
      <FormError message={errors.root?.server?.message} />
      <TextField label="Code" autoComplete="off" autoFocus help="2–30 letters, digits and dashes, like TOUCH-4K." error={errors.code?.message} {...register('code')} />
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextField label="Product" autoComplete="off" help="What the recipe makes, as the lab names it." error={errors.product?.message} {...register('product')} />
      <TextAreaField label="Notes" help="Optional: anything a reader should know first." error={errors.notes?.message} {...register('notes')} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" isPending={create.isPending} pendingLabel="Creating…">
          Create recipe
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
