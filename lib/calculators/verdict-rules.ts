/**
 * One verdict rule per calculator: what its numbers mean for this site, in one
 * sentence. Each reads the engine's own output (results and warning codes) and
 * draws its lines from VERDICT_LIMITS, so a verdict never disagrees with the
 * warnings shown under it.
 */
import type {
  ArrayPlannerResults,
  CalcOutput,
  DeliveryLineResults,
  DemandAndStorageResults,
  DrivePipeCheckResults,
  SourceFlowResults,
  StallCheckResults,
  UnitSystem,
  YieldEstimateResults,
} from '@/lib/hydraulics';
import { formatQuantity } from './format';
import { causeStrength, percent, times, verdict, VERDICT_LIMITS as L, type Verdict } from './verdict-limits';

type Rule<R> = (output: CalcOutput<R>, units: UnitSystem) => Verdict;

const has = (output: CalcOutput<unknown>, code: string) => output.warnings.some((w) => w.code === code);

export const yieldVerdict: Rule<YieldEstimateResults> = (output, u) => {
  const r = output.results;
  const perDay = formatQuantity('dailyVolume', r.deliveredPerDayM3PerDay, u);
  const ceiling = formatQuantity('length', r.maxLiftM, u);
  if (r.liftRatio > L.maxLiftRatio.value)
    return verdict(
      'wont-work',
      `The lift is ${times(r.liftRatio)} the fall, past the ${L.maxLiftRatio.value} times (${ceiling} here) where the published efficiency table ends, so the engine cannot vouch for any delivery: find more fall or lift in stages.`,
      true,
    );
  if (has(output, 'fall-below-minimum'))
    return verdict(
      'marginal',
      `The fall is at or below the ${formatQuantity('length', L.minFallM.value, u)} most rams need to beat reliably: expect about ${perDay} if it runs at all.`,
    );
  if (r.liftRatio > L.marginalLiftRatio.value)
    return verdict(
      'marginal',
      `The lift is ${times(r.liftRatio)} the fall, near the ${L.maxLiftRatio.value} times a ram can manage (${ceiling} here): about ${perDay}, and a little less fall would cut it sharply.`,
    );
  if (r.liftRatio < L.lowLiftRatio.value)
    return verdict(
      'marginal',
      `The lift is only ${times(r.liftRatio)} the fall: the ram delivers about ${perDay} but wastes most of its water for little height, so a gravity line may suit better.`,
    );
  if (r.measured && r.measured.dAubuisson < r.band.low)
    return verdict(
      'marginal',
      `Your pump works at ${percent(r.measured.dAubuisson)}, below the ${percent(r.band.low)}–${percent(r.band.high)} usual at this lift: tuning the waste valve and clearing air usually brings it up.`,
    );
  return verdict(
    'works',
    `The lift is ${times(r.liftRatio)} the fall, well within the ${L.maxLiftRatio.value} times a ram manages (${ceiling} here): expect about ${perDay}.`,
  );
};

export const deliveryLineVerdict: Rule<DeliveryLineResults> = (output, u) => {
  const r = output.results;
  const loss = r.frictionHeadM + r.minorHeadM;
  const share = r.staticHeadM > 0 ? loss / r.staticHeadM : 0;
  const lossText = formatQuantity('length', loss, u);
  const liftText = formatQuantity('length', r.staticHeadM, u);
  if (has(output, 'delivery-pressure-above-rating'))
    return verdict(
      'wont-work',
      `The pressure at the pump, ${formatQuantity('pressure', r.pumpPressurePa, u)}, is above what this pipe is rated for: choose a higher-rated pipe.`,
    );
  if (share > L.deliveryLossWontWork.value)
    return verdict(
      'wont-work',
      `Friction costs ${lossText}, more than the ${liftText} lift itself, so the ram works against more than twice the height: use a larger pipe.`,
    );
  if (!r.withinTarget)
    return verdict(
      'marginal',
      `Friction costs ${lossText}, ${percent(share)} of the ${liftText} lift and more than the ${formatQuantity('length', r.targetLossM, u)} you accept; a larger pipe gives back delivery.`,
    );
  if (has(output, 'delivery-velocity-high'))
    return verdict(
      'marginal',
      `Friction is within what you accept, but the water moves at ${formatQuantity('velocity', r.velocityMs, u)}, fast enough to wear fittings and hammer the line.`,
    );
  return verdict(
    'works',
    `Friction costs ${lossText}, ${percent(share)} of the ${liftText} lift, within the ${formatQuantity('length', r.targetLossM, u)} you accept.`,
  );
};

export const drivePipeVerdict: Rule<DrivePipeCheckResults> = (output, u) => {
  const r = output.results;
  const peak = formatQuantity('pressure', r.peakPressurePa, u);
  const rating = formatQuantity('pressure', r.weakestRatingPa, u);
  if (has(output, 'threaded-joint-refused'))
    return verdict(
      'wont-work',
      'This pipe is not to be threaded: use solvent-welded or fused joints, or a heavier pipe.',
    );
  if (r.ratingMargin < 1)
    return verdict(
      'wont-work',
      `A sudden stop can reach ${peak}, above the ${formatQuantity('pressure', r.pressureRatingPa, u)} the pipe is rated for: it can burst.`,
    );
  if (!r.rigid)
    return verdict(
      'wont-work',
      'This pipe stretches under the surge and soaks up the energy the pump needs: use steel or PVC for the drive pipe.',
    );
  const lh = r.guides.find((g) => g.ratio === 'L/H');
  if (lh && !lh.within)
    return verdict(
      'marginal',
      `The drive pipe is ${times(lh.value)} the fall, outside the ${lh.min}–${lh.max} times rams are usually given: ${lh.value < lh.min ? 'the pump may beat fast and weakly' : 'the pump may beat slowly and lose delivery'}.`,
    );
  if (r.ratingMargin < L.ratingMargin.value)
    return verdict(
      'marginal',
      `The pipe's rating is only ${times(r.ratingMargin)} the surge peak of ${peak}, short of the ${L.ratingMargin.value} times wanted for a pipe struck at every beat.`,
    );
  if (r.shutOffMargin < 1)
    return verdict(
      'marginal',
      `Against a closed delivery the ram can reach ${formatQuantity('pressure', r.shutOffPressurePa, u)}, above the ${rating} rating: fit a relief valve and never let it beat against a shut valve.`,
    );
  if (r.fatigue && r.fatigue.yearsToFailure < L.fatigueYears.value)
    return verdict(
      'marginal',
      `The pipe stands the surge, but at ${r.fatigue.beatsPerMinute} beats a minute PVC may crack from fatigue in about ${Math.max(1, Math.round(r.fatigue.yearsToFailure))} years.`,
    );
  const ld = r.guides.find((g) => g.ratio === 'L/D');
  if (ld && !ld.within)
    return verdict(
      'marginal',
      `The length is ${Math.round(ld.value)} pipe diameters, outside the ${ld.min}–${ld.max} usual: ${ld.value < ld.min ? 'a narrower or longer pipe' : 'a wider or shorter pipe'} suits the pump better.`,
    );
  return verdict(
    'works',
    `The length suits the fall and the surge peak, ${peak}, is well within the pipe's ${rating} rating.`,
  );
};

export const arrayVerdict: Rule<ArrayPlannerResults> = (output, u) => {
  const r = output.results;
  const perDay = formatQuantity(
    'dailyVolume',
    r.staged ? r.staged.topYieldPerDayM3PerDay : r.combinedPerDayM3PerDay,
    u,
  );
  const ceiling = formatQuantity('length', r.maxLiftM, u);
  const running = r.pumps.filter((p) => p.runs).length;
  if (r.pumpHeadM > r.maxLiftM)
    return verdict(
      'wont-work',
      `The pumps would have to lift ${formatQuantity('length', r.pumpHeadM, u)}, past the ${ceiling} where the published efficiency table ends for this fall, so the engine cannot vouch for any delivery: pump in stages or find more fall.`,
      true,
    );
  // the upper pump has no fittings of its own, so it delivers nothing only past the table's last ratio
  if (r.staged && r.staged.upperDeliveredFlowM3s <= 0)
    return verdict(
      'wont-work',
      `The upper pump's lift is past the ${L.maxLiftRatio.value} times its fall where the published efficiency table ends, so the engine cannot vouch for any water at the top: add a stage or give it more fall.`,
      true,
    );
  if (running === 0 || r.combinedDeliveryM3s <= 0)
    return verdict('wont-work', 'None of the pumps runs as laid out: take the fittings out of the drive pipes.');
  if (r.sourceShare !== undefined && r.sourceShare > 1)
    return verdict(
      'wont-work',
      `The pumps need ${formatQuantity('flow', r.totalDriveFlowM3s, u)}, more than the source can spare: use fewer pumps.`,
    );
  if (r.sourceShare !== undefined && r.sourceShare > L.sourceShare.value)
    return verdict(
      'marginal',
      `The pumps take ${percent(r.sourceShare)} of what the source can spare, more than the half that leaves the stream alive in a dry month; they deliver about ${perDay}.`,
    );
  if (running < r.pumps.length)
    return verdict(
      'marginal',
      `${r.pumps.length - running} of ${r.pumps.length} pumps will not run with the fittings in their drive pipes; the rest deliver about ${perDay}.`,
    );
  if (r.staged && !r.staged.runsAroundTheClock)
    return verdict(
      'marginal',
      `The lower pumps keep the upper one going ${percent(r.staged.dutyFraction)} of the day: about ${perDay} reaches the top.`,
    );
  const friction = r.deliveryFrictionHeadM + r.deliveryMinorHeadM;
  const lift = r.pumpHeadM - friction;
  if (lift > 0 && friction / lift > L.deliveryLossShare.value)
    return verdict(
      'marginal',
      `Friction in the shared line costs ${formatQuantity('length', friction, u)}, ${percent(friction / lift)} of the lift: a larger line would give back delivery; about ${perDay} now.`,
    );
  return verdict(
    'works',
    `${r.pumps.length === 1 ? 'The pump delivers' : `The ${r.pumps.length} pumps deliver`} about ${perDay}${r.staged ? ' at the top' : ''}, within the ${ceiling} a ram can lift from this fall.`,
  );
};

export const stallVerdict: Rule<StallCheckResults> = (output, u) => {
  const r = output.results;
  const top = r.causes[0];
  if (r.liftRatio > L.maxLiftRatio.value)
    return verdict(
      'wont-work',
      `The lift is ${times(r.liftRatio)} the fall, past the ${L.maxLiftRatio.value} times where the published efficiency table ends, so the engine cannot vouch for any delivery: no tuning will make this pump lift so high.`,
      true,
    );
  if (r.sourceShare !== undefined && r.sourceShare > 1)
    return verdict(
      'wont-work',
      `The pumps need ${formatQuantity('flow', r.totalDriveFlowM3s, u)}, more than the source can spare: it will stop whenever the intake runs low.`,
    );
  if (top && causeStrength(top.score) === 'strong sign')
    return verdict('wont-work', `Not as it stands: the likeliest cause is ${lower(top.title)}; fix that first.`);
  if (top && causeStrength(top.score) === 'some sign')
    return verdict(
      'marginal',
      `It may run, but there is some sign of one cause, ${lower(top.title)}: check that first.`,
    );
  return verdict(
    'works',
    `Nothing in these numbers stops a ram here: expect about ${formatQuantity('smallFlow', r.expectedDeliveryM3s, u)} at about ${Math.round(r.expectedBeatsPerMinute)} beats a minute.`,
  );
};

export const sourceFlowVerdict: Rule<SourceFlowResults> = (output, u) => {
  const r = output.results;
  const flow = formatQuantity('flow', r.flowM3s, u);
  if (has(output, 'weir-head-out-of-range'))
    return verdict(
      'marginal',
      `The head over the notch is outside the range the weir equations hold for, so the engine cannot vouch for the ${flow} it works out: use another notch.`,
      true,
    );
  if (r.planShare !== undefined && r.planShare > 1)
    return verdict(
      'wont-work',
      `The drive flow you plan is more than the ${flow} the source gives: plan a smaller pump.`,
    );
  if (r.planShare !== undefined && r.planShare > L.sourceShare.value)
    return verdict(
      'marginal',
      `Your plan takes ${percent(r.planShare)} of the ${flow} the source gives, more than the half that leaves the stream alive in a dry month.`,
    );
  if (has(output, 'bucket-spread-high') || has(output, 'few-trials') || has(output, 'weir-not-fully-contracted'))
    return verdict(
      'marginal',
      `The source gives about ${flow}, but the measurement is uncertain: time a few more trials before you size a pump on it.`,
    );
  return verdict(
    'works',
    `The source gives about ${flow}; a ram may take up to half of it, ${formatQuantity('flow', r.flowM3s * L.sourceShare.value, u)}, and leave the stream the rest.`,
  );
};

export const demandVerdict: Rule<DemandAndStorageResults> = (output, u) => {
  const r = output.results;
  const delivery = formatQuantity('dailyVolume', r.deliveryM3PerDay, u);
  const demand = formatQuantity('dailyVolume', r.totalDemandM3PerDay, u);
  if (r.totalDemandM3PerDay <= 0)
    return verdict(
      'ask',
      `Enter the people, garden or stock the water is for, to weigh them against the ${delivery} the ram delivers.`,
    );
  if (r.surplusM3PerDay < 0)
    return verdict(
      'wont-work',
      `You need ${demand} and the ram delivers ${delivery}: short by ${formatQuantity('dailyVolume', -r.surplusM3PerDay, u)}, which no tank makes up.`,
    );
  if (r.coverage < L.demandCover.value)
    return verdict(
      'marginal',
      `The ram delivers ${delivery} against the ${demand} you need: it keeps up, with little to spare for a dry week or a leak.`,
    );
  return verdict(
    'works',
    `The ram delivers ${delivery} against the ${demand} you need, with ${formatQuantity('dailyVolume', r.surplusM3PerDay, u)} to spare.`,
  );
};

const lower = (s: string) => (s.length > 1 && s[1] === s[1]?.toLowerCase() ? s[0]!.toLowerCase() + s.slice(1) : s);
