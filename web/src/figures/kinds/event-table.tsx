import { AnomalyFields, Binding, CarbonList, EventFields, type KindFieldsProps } from '../form-fields';

/** Form fields of an event table. */
export function EventTableFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="index" label="Climate index" series={series} />
      <CarbonList series={series} />
      <AnomalyFields />
      <EventFields />
    </>
  );
}
