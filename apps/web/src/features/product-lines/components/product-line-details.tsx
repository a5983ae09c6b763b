import { zodResolver } from '@hookform/resolvers/zod';
import { type ProductLine, productLineInputSchema } from '@polecourt/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/text-field';

import { useUpdateProductLine } from '../api/update-product-line';

/** "Rename or describe": for systems engineers and administrators only. */
export function EditProductLineButton({ line }: { line: ProductLine }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button onClick={() => setOpen(true)}>Rename or describe</Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Rename or describe ${line.name}`}>
        {open && <EditProductLineForm line={line} onDone={() => setOpen(false)} />}
      </Dialog>
    </>
  );
}

function EditProductLineForm({ line, onDone, schema = productLineInputSchema }: { line: ProductLine; onDone: () => void; schema?: typeof productLineInputSchema }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isDirty },
  } = useForm<z.input<typeof productLineInputSchema>, unknown, z.output<typeof productLineInputSchema>>({
    resolver: zodResolver(schema),
    defaultValues: { name: line.name, description: line.description },
  });
  const update = useUpdateProductLine({
    mutationConfig: {
      onSuccess: onDone,
      onError: (error) => {
        if (error.code === 'name_taken') setError('name', { message: error.message });
        if (error.fields.name) setError('name', { message: error.fields.name });
      },
    },
  });
  return (
    <form noValidate onSubmit={handleSubmit((data) => update.mutate({ id: line.id, data }))} className="flex flex-col gap-4">
      {update.error && update.error.code !== 'name_taken' && !update.error.fields.name && (
        <Alert tone="error" title="Nothing was changed">
          <p>{update.error.message}</p>
        </Alert>
      )}
      <TextField label="Name" autoFocus autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextField label="Description" autoComplete="off" error={errors.description?.message} {...register('description')} />
      <div className="flex justify-end gap-2">
        <Button onClick={onDone}>Cancel</Button>
        <Button type="submit" variant="primary" busy={update.isPending} disabled={!isDirty}>
          Save
        </Button>
      </div>
    </form>
  );
}
