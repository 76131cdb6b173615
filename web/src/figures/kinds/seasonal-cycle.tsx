import { BasePeriod, Binding, type KindFieldsProps } from '../form-fields';

/** Form fields of a seasonal-cycle figure. */
export function SeasonalCycleFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="series" label="Series" series={series} />
      <BasePeriod path="base" />
    </>
  );
}
