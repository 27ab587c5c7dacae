/** The caution every result screen and report shows. One definition; import it. */
export const CAUTION_TEXT =
  'Identification is tentative until confirmed with an authentic standard or an orthogonal method. ' +
  'Regulatory decisions follow accredited methods and local rules. ' +
  'Handle solvents and samples under your lab\'s safety practice.';
