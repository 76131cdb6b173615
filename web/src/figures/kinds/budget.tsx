import { Binding, BudgetTerms, type KindFieldsProps } from '../form-fields';

/** Form fields of a budget figure. */
export function BudgetFields({ series }: KindFieldsProps) {
  return (
    <>
      <Binding path="tendency" label="Tendency (rate of change of the inventory)" series={series} />
      <BudgetTerms series={series} />
    </>
  );
}
