import { ProductNumberField } from './product-number-field';
import { ProductSection } from './product-section';

export function ProductMixFields() {
  return (
    <ProductSection title="Mix" description="Parts by volume. A one-component product has 0 hardener parts.">
      <ProductNumberField name="mixBaseParts" label="Base parts" />
      <ProductNumberField name="mixHardenerParts" label="Hardener parts" />
      <ProductNumberField name="thinnerMinPct" label="Thinner, least" unit="%" />
      <ProductNumberField name="thinnerMaxPct" label="Thinner, most" unit="%" />
      <ProductNumberField name="inductionMin" label="Induction time" unit="min" hint="Stand time after mixing, before spraying." />
      <ProductNumberField name="potLifeMin" label="Pot life" unit="min" hint="Empty if the product has none (one-component)." optional />
    </ProductSection>
  );
}
