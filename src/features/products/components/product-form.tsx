import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { createProductSchema, type Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateProduct } from '../../../api/products/create-product';
import { useUpdateProduct } from '../../../api/products/update-product';
import { DryingTimesEditor } from './drying-times-editor';
import { ProductIdentityFields } from './product-identity-fields';
import { ProductLimitsFields } from './product-limits-fields';
import { ProductMixFields } from './product-mix-fields';
import { productFieldNames, startingValues, toRequest, type ProductFormInput, type ProductFormOutput } from './product-form-values';

interface ProductFormProps {
  /** The saved data sheet to edit; without it the form adds a new one. */
  product?: Product;
  onSaved?: (product: Product) => void;
  onCancel?: () => void;
}

/** Every field of a data sheet, checked with the same schema the server uses, entered in metric as stored. */
export function ProductForm({ product, onSaved, onCancel }: ProductFormProps) {
  const createProduct = useCreateProduct();
  const updateProduct = useUpdateProduct();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ProductFormInput, unknown, ProductFormOutput>({ resolver: zodResolver(createProductSchema), defaultValues: startingValues(product) });

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      const body = toRequest(values);
      const saved = product ? await updateProduct.mutateAsync({ id: product.id, changes: body }) : await createProduct.mutateAsync(body);
      toast.success(product ? `Data sheet “${saved.name}” is saved.` : `Data sheet “${saved.name}” is added.`);
      form.reset(startingValues(saved));
      onSaved?.(saved);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, productFieldNames));
    }
  });

  const pending = createProduct.isPending || updateProduct.isPending;
  const hasErrors = Object.keys(form.formState.errors).length > 0;

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={product ? `Edit ${product.name}` : 'New data sheet'} className="space-y-5">
        <FormAlert message={formError} />
        <p className="text-sm text-maple-700">Figures are entered in metric units, as the data sheet and Boothwright store them.</p>
        <ProductIdentityFields />
        <ProductMixFields />
        <ProductLimitsFields />
        <DryingTimesEditor />
        {hasErrors && !formError && (
          <p role="alert" className="font-medium text-verdict-stop">
            <span aria-hidden="true">⚠ </span>Some fields need attention; each says what is wrong beside it.
          </p>
        )}
        <div className="flex flex-wrap justify-end gap-3">
          {onCancel && (
            <Button variant="secondary" onClick={onCancel}>
              Cancel
            </Button>
          )}
          <Button type="submit" pending={pending} pendingText="Saving…">
            {product ? 'Save changes' : 'Save data sheet'}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
