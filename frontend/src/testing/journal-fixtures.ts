import type { FindView, LakeView } from '@shoalbook/shared';

/** An invented lake for component tests, on the lake clock of America/Chicago (CDT, UTC−5, in spring and summer). */
export const testLake: LakeView = {
  id: 'l1',
  name: 'Test Reservoir',
  region: 'Test',
  timeZone: 'America/Chicago',
  lat: 34.5,
  lon: -86.2,
  areaAcres: null,
  notes: '',
  version: 1,
};

/** An invented hard-bottom find on that lake, 14 ft deep; what a test relies on goes in `over`. */
export function testFind(over: Pick<FindView, 'id' | 'name'> & Partial<FindView>): FindView {
  return {
    lakeId: 'l1',
    eventId: null,
    practiceDate: null,
    markedAt: null,
    lat: 34.5,
    lon: -86.2,
    depthFt: 14,
    kind: 'hard-bottom',
    subKind: 'shell',
    hardness: 4,
    vegetationDensity: null,
    baitSeen: false,
    fishMarked: null,
    frequencyKhz: null,
    foundHow: null,
    waterTempF: null,
    notes: '',
    photoId: null,
    ...over,
  };
}
