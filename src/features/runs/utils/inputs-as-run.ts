/** The scenario flattened to one row per input; shared with the report and its downloads. */
export { flattenInputs, kindOfKey, type InputRow } from '../../../../shared/report/inputs';
