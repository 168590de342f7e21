import { ProductDurationField } from './product-duration-field';
import { ProductNumberField } from './product-number-field';
import { ProductSection } from './product-section';

export function ProductMixFields() {
  return (
    <ProductSection title="Mix" description="Parts by volume. A one-component product has 0 hardener parts.">
      <ProductNumberField name="mixBaseParts" label="Base parts" />
      <ProductNumberField name="mixHardenerParts" label="Hardener parts" />
      <ProductNumberField name="thinnerMinPct" label="Thinner, least" unit="%" hint="Leave both thinner boxes empty if the data sheet gives no range; thinning is then not checked." optional />
      <ProductNumberField name="thinnerMaxPct" label="Thinner, most" unit="%" hint="0 to 0 means the data sheet says do not thin." optional />
      <ProductDurationField name="inductionMin" label="Induction time" hint="Stand time after mixing, before spraying." />
      <ProductDurationField name="potLifeMin" label="Pot life" hint="Empty if the product has none (one-component)." optional />
    </ProductSection>
  );
}
