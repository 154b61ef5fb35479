/**
 * The long-duct chunk (loadLongDuctApi): the engine's long-duct answer and its files (engine/report/longDuctReport.ts,
 * the same functions `tenuis duct` calls), the shipped coefficient tables and the check of a user's table. A solve
 * takes milliseconds, so it runs on the page's thread; nothing here touches the DOM.
 */
export {
  longDuctAnswer,
  longDuctProfile,
  longDuctProfileCsv,
  longDuctConductanceCurve,
  conductanceCurveCsv,
  pressureRange,
} from '../../engine/report/longDuctReport';
export { BUILTIN_TABLES } from '../../engine/longDuct/builtinTables';
export { tableProblem } from '../../engine/longDuct/coefficientTable';
