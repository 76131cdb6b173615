/** The toy kind's form fields (common/test-fixtures/toy-kind): what a new kind adds on the web. */
import { Binding, NumberField, type KindFieldsProps } from './form-fields';

export function RecentMeanFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="series" label="Series" series={series} />
      <NumberField path="months" label="Last months" />
    </>
  );
}
