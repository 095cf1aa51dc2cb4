import {
  ArrayPlanner,
  DeliveryLine,
  DemandAndStorage,
  DrivePipeCheck,
  SourceFlow,
  StallCheck,
  YieldEstimate,
} from './Calculators';

/** The calculator components MDX guides may use, by their tag names. */
export const calculatorMdxComponents = {
  YieldEstimate,
  ArrayPlanner,
  DrivePipeCheck,
  DeliveryLine,
  SourceFlow,
  DemandAndStorage,
  StallCheck,
};
