/** What the hover card says about a bead: where it is (row, unit, place in each unit that holds it) and its colour. */
import type { Model } from '../../../shared/model.js';

export interface BeadInfo {
  bead: number;
  lines: string[];
}

export function beadInfo(model: Model, beadId: number): BeadInfo | null {
  const bead = model.beads[beadId];
  if (!bead) return null;
  const colour = model.palette.find((p) => p.key === bead.color);
  const lines = bead.units.map((u, i) => {
    const unit = model.units[u];
    const word = model.rows.find((r) => r.row === unit?.row)?.word === 'round' ? 'Round' : 'Row';
    return unit ? `${word} ${unit.row}, unit ${unit.index}, ${bead.places[i]}` : '';
  });
  lines.push(`Colour ${bead.color}${colour?.name ? ` ${colour.name}` : ''} (${colour?.hex ?? 'unknown'})`);
  return { bead: beadId, lines: lines.filter(Boolean) };
}
