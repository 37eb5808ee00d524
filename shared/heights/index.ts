/*
 * shared/heights — support heights from field readings.
 *   tangentHeightM, twoAngleHeightM, percentHeightM, laserSineHeightM
 *   usableAttachmentHeightM({ treeHeightM, method, scoutEstimateM? }), LAUNCH_METHODS, LAUNCH_REACH_M
 */
export { tangentHeightM, twoAngleHeightM, percentHeightM, laserSineHeightM } from './clinometer';
export { usableAttachmentHeightM, LAUNCH_METHODS, LAUNCH_REACH_M, USABLE_FRACTION_OF_TREE } from './attachment';
export type { LaunchMethod, AttachmentEstimate } from './attachment';
