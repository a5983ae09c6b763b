import { zodResolver } from '@hookform/resolvers/zod';
import type { ProductLine } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

import { type ProductLineInput, productLineInputSchema, useCreateProductLine } from '../api/create-product-line';

export function CreateProductLineForm({
  schema = productLineInputSchema,
  onCreated,
  onCancel,
}: {
  schema?: typeof productLineInputSchema;
  onCreated: (line: ProductLine) => void;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ProductLineInput, unknown, z.output<typeof productLineInputSchema>>({ resolver: zodResolver(schema), defaultValues: { name: '', description: '' } });
  const create = useCreateProductLine({
    mutationConfig: {
      onSuccess: onCreated,
      onError: (error) => {
        if (error.code === 'name_taken') setError('name', { message: error.message });
        if (error.fields.name) setError('name', { message: error.fields.name });
        if (error.fields.description) setError('description', { message: error.fields.description });
      },
    },
  });
  const inline = create.error && (create.error.code === 'name_taken' || create.error.fields.name || create.error.fields.description);
  return (
    <form noValidate onSubmit={handleSubmit((data) => create.mutate(data))} className="flex flex-col gap-4">
      {create.error && !inline && (
        <Alert tone="error" title="The product line was not created">
          <p>{create.error.message}</p>
        </Alert>
      )}
      <TextField label="Name" autoFocus autoComplete="off" hint="e.g. “TG-4 gimbal pitch axis”." error={errors.name?.message} {...register('name')} />
      <TextField label="Description" autoComplete="off" hint="What the products have in common." error={errors.description?.message} {...register('description')} />
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create product line
        </Button>
      </div>
    </form>
  );
}
