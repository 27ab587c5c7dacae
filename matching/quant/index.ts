export * from './qnmrConcentration';
export * from './qnmrPurity';
export * from './formulaMolarMass';
export * from './fitToAmounts';
export * from './fitToPurity';
export * from './amountsCombineSet';
