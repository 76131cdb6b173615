import { BasePeriod, ChoiceField, NamedChoiceField, useZonalFieldChoices } from '../form-fields';

/** Form fields of a time–latitude diagram (it binds a zonal-mean field, not a series). */
export function HovmollerFields() {
  return (
    <>
      <NamedChoiceField
        path="zonalFieldId"
        label="Zonal-mean field"
        options={useZonalFieldChoices()}
        empty="No zonal-mean field yet: keep a gridded NetCDF variable from an upload and make a zonal mean of it."
      />
      <ChoiceField path="show" label="Show" options={[['anomaly', 'Anomaly'], ['raw', 'Values as stored']]} />
      <BasePeriod path="base" />
    </>
  );
}
