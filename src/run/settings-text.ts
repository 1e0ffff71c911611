import type { SessionSettings } from '../export/session';
import { areaText } from './area-choice';
import { assignText } from './assign-choice';
import { binsText } from './bins-choice';
import type { CurvesSettings } from './curves-settings';
import { gridText } from './grid-choice';
import { DEFAULT_RUN_SETTINGS, type RunSettings } from './run-settings';

/**
 * The settings as text, the form of session files and worker messages; parseRunSettings reads it
 * back. The settings of gaps and of a fixed region are written only when they differ from their
 * defaults, so a coverage run's session reads as it did before they existed.
 */
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
    ...(settings.area.kind === DEFAULT_RUN_SETTINGS.area.kind ? {} : { area: areaText(settings.area) }),
    ...(settings.bandDeg === DEFAULT_RUN_SETTINGS.bandDeg ? {} : { bandDeg: settings.bandDeg }),
    ...(settings.within === DEFAULT_RUN_SETTINGS.within ? {} : { within: settings.within }),
  };
}

function curvesText(curves: CurvesSettings): Pick<SessionSettings, 'quorum' | 'trials' | 'rarefy' | 'ageTrials' | 'regionKm'> {
  const { quorum, trials, rarefy, ageTrials, regionKm } = curves;
  return { quorum, trials, ...(rarefy === undefined ? {} : { rarefy }), ...(ageTrials === undefined ? {} : { ageTrials }), regionKm };
}
