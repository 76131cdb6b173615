import { AnomalyFields, Binding, ChoiceField, EventFields, type KindFieldsProps } from '../form-fields';

/** Form fields of a series-over-time figure. */
export function TimeseriesFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="series" label="Series" series={series} />
      <ChoiceField path="show" label="Show" options={[['anomaly', 'Anomaly'], ['raw', 'Values as stored']]} />
      <Binding path="index" label="Index for event shading" noneLabel="The series itself" series={series} />
      <AnomalyFields />
      <EventFields />
    </>
  );
}
