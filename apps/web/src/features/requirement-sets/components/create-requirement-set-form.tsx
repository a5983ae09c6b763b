import { zodResolver } from '@hookform/resolvers/zod';
import type { RequirementSet } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

import { type RequirementSetInput, requirementSetInputSchema, useCreateRequirementSet } from '../api/create-requirement-set';

export function CreateRequirementSetForm({
  productLineId,
  schema = requirementSetInputSchema,
  onCreated,
  onCancel,
}: {
  productLineId: number;
  schema?: typeof requirementSetInputSchema;
  onCreated: (set: RequirementSet) => void;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<RequirementSetInput, unknown, z.output<typeof requirementSetInputSchema>>({ resolver: zodResolver(schema), defaultValues: { name: '', purpose: '' } });
  const create = useCreateRequirementSet({
    mutationConfig: {
      onSuccess: onCreated,
      onError: (error) => {
        if (error.code === 'name_taken') setError('name', { message: error.message });
        if (error.fields.name) setError('name', { message: error.fields.name });
        if (error.fields.purpose) setError('purpose', { message: error.fields.purpose });
      },
    },
  });
  const shownInline = create.error && (create.error.code === 'name_taken' || create.error.fields.name || create.error.fields.purpose);
  return (
    <form noValidate onSubmit={handleSubmit((data) => create.mutate({ productLineId, data }))} className="flex flex-col gap-4">
      {create.error && !shownInline && (
        <Alert tone="error" title="The requirement set was not created">
          <p>{create.error.message}</p>
        </Alert>
      )}
      <TextField label="Name" autoFocus autoComplete="off" hint="e.g. “Pitch step response”." error={errors.name?.message} {...register('name')} />
      <TextField label="Purpose" autoComplete="off" hint="Which response these limits are for: the step, the operating point, the payload." error={errors.purpose?.message} {...register('purpose')} />
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create requirement set
        </Button>
      </div>
    </form>
  );
}
