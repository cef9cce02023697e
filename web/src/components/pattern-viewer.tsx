/** Chart and stepper side by side (stacked on a phone): the view shared by the pattern page, share links and the preview. */
import { useMemo } from 'react';
import type { Model } from '../../../shared/model.js';
import { buildSteps } from '../../../shared/steps.js';
import { placeOf, unitAt, type StepPlace } from '../lib/stepper.js';
import { useDark } from '../lib/use-dark.js';
import { ChartView } from './chart-view.js';
import { RowStepper } from './row-stepper.js';

export function PatternViewer({
  model,
  place,
  onPlace,
  onPick,
  noted,
}: {
  model: Model;
  place: StepPlace | undefined;
  onPlace(p: StepPlace): void;
  /** A unit picked on the chart (clicked, or Enter on the chart): the stepper goes there too. */
  onPick?(p: StepPlace): void;
  noted?: readonly number[];
}) {
  const dark = useDark();
  const steps = useMemo(() => buildSteps(model), [model]);
  const unit = place ? unitAt(model, place) : undefined;
  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <ChartView
        model={model}
        dark={dark}
        current={unit?.id}
        noted={noted}
        enterPicks={onPick !== undefined}
        onPick={(id) => {
          const u = model.units[id];
          if (!u) return;
          onPlace(placeOf(u));
          onPick?.(placeOf(u));
        }}
      />
      {place ? (
        <RowStepper model={model} steps={steps} place={place} onPlace={onPlace} />
      ) : (
        <p>This pattern has no units yet.</p>
      )}
    </div>
  );
}
