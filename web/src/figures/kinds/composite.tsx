import { Flex } from '@radix-ui/themes';
import { AnomalyFields, Binding, ChoiceField, EventFields, Group, NumberField, type KindFieldsProps } from '../form-fields';

/** Form fields of a composite figure. */
export function CompositeFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="index" label="Climate index" series={series} />
      <Binding path="series" label="Carbon series" series={series} />
      <Group legend="Composite">
        <Flex gap="3" wrap="wrap">
          <ChoiceField path="phase" label="Events" options={[['warm', 'Warm events'], ['cold', 'Cold events']]} />
          <NumberField path="before" label="Months before the peak" />
          <NumberField path="after" label="Months after the peak" />
          <NumberField path="confidence" label="Confidence level" step={0.01} />
        </Flex>
      </Group>
      <AnomalyFields />
      <EventFields />
    </>
  );
}
