import type { SessionSettings } from '../export/session';
import { assignText } from './assign-choice';
import { binsText } from './bins-choice';
import type { CurvesSettings } from './curves-settings';
import { gridText } from './grid-choice';
import type { RunSettings } from './run-settings';

/** The settings as text, the form of session files and worker messages; parseRunSettings reads it back. */
export function settingsText(settings: RunSettings): SessionSettings {
  return {
    bins: binsText(settings.bins),
    assign: assignText(settings.assign),
    seed: settings.seed,
    grid: gridText(settings.grid),
    map: settings.map,
    rotateAt: settings.rotateAt,
    preferModel: settings.preferModel,
    beyondModel: settings.beyondModel,
    ...(settings.curves === undefined ? {} : curvesText(settings.curves)),
  };
}

function curvesText(curves: CurvesSettings): Pick<SessionSettings, 'quorum' | 'trials' | 'rarefy' | 'ageTrials' | 'regionKm'> {
  const { quorum, trials, rarefy, ageTrials, regionKm } = curves;
  return { quorum, trials, ...(rarefy === undefined ? {} : { rarefy }), ...(ageTrials === undefined ? {} : { ageTrials }), regionKm };
}
