import { analysisRunHere } from './analysisRunHere';

export { STAGE_TEXT, type AnalysisInput, type AnalysisStage } from './analysisStages';
export { analysisRunHere };

export const analysisRun = analysisRunHere;
