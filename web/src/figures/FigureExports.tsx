import { Button, Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { FigureResult } from '@upwell/common';
import type { VisualizationSpec } from 'vega-embed';
import { figureCsv } from './csv';
import { exportName, figurePngUrl, figureSvg, saveFile } from './exports';

/** Download buttons of one figure: SVG and PNG of the chart (if it has one) and its data as CSV. */
export function FigureExports({ result, spec, baseName }: { result: FigureResult; spec: VisualizationSpec | null; baseName: string }) {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const run = async (what: string, make: () => Promise<void>) => {
    setBusy(what);
    setError(null);
    try {
      await make();
    } catch (e) {
      setError(`The ${what} could not be made (${e instanceof Error ? e.message : String(e)}). Try again, or download the data as CSV.`);
    } finally {
      setBusy(null);
    }
  };
  return (
    <Flex gap="2" align="center" wrap="wrap" className="upwell-figure-exports">
      {spec && (
        <>
          <Button size="1" variant="soft" color="gray" loading={busy === 'SVG'} onClick={() => run('SVG', async () => saveFile(`${baseName}.svg`, await figureSvg(spec), 'image/svg+xml'))}>
            Download SVG
          </Button>
          <Button size="1" variant="soft" color="gray" loading={busy === 'PNG'} onClick={() => run('PNG', async () => saveFile(`${baseName}.png`, await figurePngUrl(spec), 'image/png'))}>
            Download PNG
          </Button>
        </>
      )}
      <Button size="1" variant="soft" color="gray" onClick={() => run('CSV', async () => saveFile(`${baseName}.csv`, figureCsv(result), 'text/csv'))}>
        Download data (CSV)
      </Button>
      {error && (
        <Text size="1" color="red" role="alert">
          {error}
        </Text>
      )}
    </Flex>
  );
}

export { exportName };
