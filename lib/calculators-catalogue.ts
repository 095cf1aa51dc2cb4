/** The calculators as the site lists them: id, name, one line, and the guide that explains it. */
export const CALCULATOR_CATALOGUE = [
  { id: 'yield-estimate', name: 'Yield estimate', line: 'How much a ram delivers at your fall and lift, and what it uses.', guide: 'will-a-ram-meet-my-demand' },
  { id: 'array-planner', name: 'Array planner', line: 'Several pumps in parallel, or in stages to reach higher.', guide: 'pumps-in-parallel-and-in-stages' },
  { id: 'drive-pipe-check', name: 'Drive pipe check', line: 'Length for the fall, surge pressure and whether the pipe will stand it.', guide: 'the-drive-pipe' },
  { id: 'delivery-line', name: 'Delivery line', line: 'Friction up to the tank and the smallest pipe that will do.', guide: 'the-delivery-line' },
  { id: 'source-flow', name: 'Source flow', line: 'Bucket and stopwatch, V-notch weir or float.', guide: 'surveying-fall-and-flow' },
  { id: 'demand-and-storage', name: 'Demand and storage', line: 'House, garden and stock against 24 hours of delivery; the tank.', guide: 'storage-overflow-and-float-valves' },
  { id: 'stall-check', name: 'Stall check', line: 'Why it stopped beating: likely causes from your site sheet.', guide: 'when-it-stops-cycling' },
] as const;

export function catalogueEntry(id: string) {
  return CALCULATOR_CATALOGUE.find((c) => c.id === id);
}
