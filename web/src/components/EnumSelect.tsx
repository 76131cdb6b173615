import { Select } from '@radix-ui/themes';
import type { CSSProperties } from 'react';

/** A select over a fixed list of values with their words (series kinds, data origins…). */
export function EnumSelect<T extends string>({
  value,
  values,
  labels,
  onChange,
  label,
  size = '2',
  style,
}: {
  value: T;
  values: readonly T[];
  labels: Record<T, string>;
  onChange: (value: T) => void;
  label: string;
  size?: '1' | '2' | '3';
  style?: CSSProperties;
}) {
  return (
    <Select.Root size={size} value={value} onValueChange={(v) => onChange(v as T)}>
      <Select.Trigger aria-label={label} style={style} />
      <Select.Content>
        {values.map((v) => (
          <Select.Item key={v} value={v}>
            {labels[v]}
          </Select.Item>
        ))}
      </Select.Content>
    </Select.Root>
  );
}
