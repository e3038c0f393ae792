/** Short cautions a target sheet shows (screen and print), in the product's own words. */
export const sheetCautions = {
  simulation:
    'Targets come from a simplified one-corner simulation: they guide tuning and do not certify a vehicle. Validate final settings on the vehicle, under the regulations and engineering practice that apply where it is used.',
  gas: 'Gas-charged dampers hold pressure: do not open, heat or puncture them. Dispose of them under local rules and the maker’s instructions.',
  release: 'Releasing this sheet changes parts fitted to vehicles. Check every target and band before you release it.',
} as const;
