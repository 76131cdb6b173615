import { AnomalyFields, Binding, NumberField, type KindFieldsProps } from '../form-fields';

/** Form fields of a scatter figure. */
export function ScatterFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="index" label="Climate index (x)" series={series} />
      <Binding path="series" label="Carbon series (y)" series={series} />
      <NumberField path="lag" label="Index leads by (months; negative: lags)" />
      <AnomalyFields />
    </>
  );
}
