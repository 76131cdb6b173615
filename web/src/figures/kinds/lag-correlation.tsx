import { Flex } from '@radix-ui/themes';
import { AnomalyFields, Binding, ChoiceField, Group, NumberField, type KindFieldsProps } from '../form-fields';

/** Form fields of a lag-correlation figure (maxLag's bounds come from its schema). */
export function LagCorrelationFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="index" label="Climate index" series={series} />
      <Binding path="series" label="Carbon series" series={series} />
      <Group legend="Correlation">
        <Flex gap="3" wrap="wrap">
          <NumberField path="maxLag" label="Lags from −N to N months" />
          <ChoiceField path="method" label="Correlation" options={[['pearson', 'Pearson'], ['spearman', 'Spearman (ranks)']]} />
          <NumberField path="alpha" label="Significance level α (pointwise, each lag alone)" step={0.01} />
          <ChoiceField path="significance" label="Per-lag test" options={[['ar1', 't test with AR(1) effective sample size'], ['phase-randomised', 'Phase-randomised surrogates']]} />
          <NumberField path="surrogates" label="Surrogates for the search-corrected p of the strongest lag" />
          <NumberField path="seed" label="Surrogate seed" />
        </Flex>
      </Group>
      <AnomalyFields />
    </>
  );
}
