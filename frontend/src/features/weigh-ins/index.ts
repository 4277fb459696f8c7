export { WeighInsPanel } from './components/weigh-ins-panel';
export { useWeighIns } from './api/weigh-ins-api';
export { LiveBagPanel } from './components/live-bag-panel';
