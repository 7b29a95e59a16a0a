import type { MeasureSystem } from '@vatside/dye-kit';
import { useState } from 'react';
import { Panel } from '../../components/Panel.tsx';
import { SystemSwitch } from '../../components/SystemSwitch.tsx';
import { AcidCalculator } from '../../features/calculators/components/AcidCalculator.tsx';
import { BathCalculator } from '../../features/calculators/components/BathCalculator.tsx';
import { DepthOfShadeCalculator } from '../../features/calculators/components/DepthOfShadeCalculator.tsx';
import { LastDropCalculator } from '../../features/calculators/components/LastDropCalculator.tsx';

/** Quick sums at the stove, worked out in the browser by dye-kit. */
export function Component() {
  const [system, setSystem] = useState<MeasureSystem>('us');
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="max-w-2xl text-vat-800">
          Amounts here are for dyeing yarn. None of them is food or safe to swallow; follow the dye
          maker’s safety data sheet.
        </p>
        <SystemSwitch system={system} onChange={setSystem} />
      </div>
      <div className="grid items-start gap-6 xl:grid-cols-2">
        <Panel
          title="Dye from stock"
          intro="Depth of shade, grams of dye and milliliters of stock."
        >
          <DepthOfShadeCalculator system={system} />
        </Panel>
        <Panel title="Acid for the bath">
          <AcidCalculator system={system} />
        </Panel>
        <Panel title="Water for the bath">
          <BathCalculator system={system} />
        </Panel>
        <Panel title="Last drop" intro="Pour leftover jars onto one skein.">
          <LastDropCalculator system={system} />
        </Panel>
      </div>
    </div>
  );
}
