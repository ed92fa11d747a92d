import type { Source } from "./types.ts";

/** Bibliography entries used by calc/heading.ts, calc/heading/calibration.ts and calc/heading/csv.ts. */
export const HEADING_SOURCES = {
  "spinner-heading-practice": {
    author: "Common practice",
    title:
      "Heading of a whole-body spinner from an accelerometer: spin rate from the radial reading, ω̂ = √((a − b̂)/r̂), integrated to a heading; the assumed radius is tuned until the robot stops drifting",
    publication: "Common practice among builders of translating whole-body spinners",
  },
  "ieee-1293-1998": {
    author: "IEEE Aerospace and Electronic Systems Society, Gyro and Accelerometer Panel",
    title: "IEEE Standard Specification Format Guide and Test Procedure for Linear, Single-Axis, Nongyroscopic Accelerometers",
    publication: "IEEE Std 1293-1998",
    locator: "accelerometer model equation: bias (this handbook's offset), scale factor and input-axis misalignment terms",
  },
  "abramowitz-stegun-1964": {
    author: "M. Abramowitz, I. A. Stegun (eds.)",
    title: "Handbook of Mathematical Functions with Formulas, Graphs, and Mathematical Tables",
    publication: "National Bureau of Standards, Applied Mathematics Series 55, 1964",
    locator:
      "ch. 3 (binomial series), ch. 4 (half-angle formulas), §26.2 (normal probability function), §26.5 (incomplete beta function), §26.7 (Student's t-distribution)",
  },
  "numerical-recipes-2007": {
    author: "W. H. Press, S. A. Teukolsky, W. T. Vetterling, B. P. Flannery",
    title: "Numerical Recipes: The Art of Scientific Computing",
    publication: "Cambridge University Press, 3rd edition, 2007",
    locator:
      "§5.6 quadratic equations (stable roots); §6.1 gamma function (Lanczos); §6.2 incomplete gamma function and error function; §6.4 incomplete beta function (continued fraction)",
  },
  "openstax-up1-rotational-kinematics": {
    author: "W. Moebs, S. J. Ling, J. Sanny",
    title: "University Physics, Volume 1",
    publication: "OpenStax, 2016",
    locator: "§10.1 Rotational Variables; §10.2 Rotation with Constant Angular Acceleration (θ = ωt)",
  },
  "hibbeler-dynamics-2016": {
    author: "R. C. Hibbeler",
    title: "Engineering Mechanics: Dynamics",
    publication: "Pearson, 14th edition, 2016",
    locator: "§16.7 Relative-motion analysis: acceleration (a_B = a_A + α × r − ω² r in the plane)",
  },
  "nist-ehandbook-propagation": {
    author: "NIST/SEMATECH",
    title: "e-Handbook of Statistical Methods",
    publication: "National Institute of Standards and Technology, 2012",
    locator: "§2.5.5 Propagation of error considerations (first-order formula)",
  },
  "nist-ehandbook-exp-smoothing": {
    author: "NIST/SEMATECH",
    title: "e-Handbook of Statistical Methods",
    publication: "National Institute of Standards and Technology, 2012",
    locator: "§6.4.3.1 Single exponential smoothing, S_t = α y_{t−1} + (1 − α) S_{t−1}",
  },
  "smith-dsp-1997": {
    author: "S. W. Smith",
    title: "The Scientist and Engineer's Guide to Digital Signal Processing",
    publication: "California Technical Publishing, 1997",
    locator: "ch. 19 Recursive Filters, single-pole low-pass: a₀ = 1 − x, b₁ = x, x = e^(−1/d) with d the time constant in samples",
  },
  "brown-1963": {
    author: "R. G. Brown",
    title: "Smoothing, Forecasting and Prediction of Discrete Time Series",
    publication: "Prentice-Hall, 1963",
    locator: "single exponential smoothing of a linear trend: steady lag of (1 − α)/α periods",
  },
  "roberts-1959": {
    author: "S. W. Roberts",
    title: "Control chart tests based on geometric moving averages",
    publication: "Technometrics 1(3), 1959, pp. 239–250",
    locator: "variance of the geometric moving average, σ² α/(2 − α) in the steady state",
  },
  "tukey-1977": {
    author: "J. W. Tukey",
    title: "Exploratory Data Analysis",
    publication: "Addison-Wesley, 1977",
    locator: "smoothing sequences with running medians (median of 3)",
  },
  "draper-smith-1998": {
    author: "N. R. Draper, H. Smith",
    title: "Applied Regression Analysis",
    publication: "Wiley, 3rd edition, 1998",
    locator: "ch. 1 Fitting a straight line by least squares: standard errors and confidence intervals of slope and intercept, R²",
  },
  "theil-1950": {
    author: "H. Theil",
    title: "A rank-invariant method of linear and polynomial regression analysis",
    publication: "Proceedings of the Koninklijke Nederlandse Akademie van Wetenschappen 53, 1950",
    locator: "part I (slope as the median of pairwise slopes)",
  },
  "sen-1968": {
    author: "P. K. Sen",
    title: "Estimates of the regression coefficient based on Kendall's tau",
    publication: "Journal of the American Statistical Association 63(324), 1968, pp. 1379–1389",
    locator: "distribution-free confidence interval for the slope from the ordered pairwise slopes",
  },
  "gilbert-1987": {
    author: "R. O. Gilbert",
    title: "Statistical Methods for Environmental Pollution Monitoring",
    publication: "Van Nostrand Reinhold, 1987",
    locator: "ch. 16, Sen's nonparametric estimator of slope: C = z·√Var(S), M₁ = (N′ − C)/2, M₂ = (N′ + C)/2, limits the M₁-th and (M₂ + 1)-th ordered slopes",
  },
  "iglewicz-hoaglin-1993": {
    author: "B. Iglewicz, D. C. Hoaglin",
    title: "How to Detect and Handle Outliers",
    publication: "ASQC Quality Press, 1993 (ASQC Basic References in Quality Control: Statistical Techniques, vol. 16)",
    locator: "modified z-score M = 0.6745 (x − x̃)/MAD; |M| > 3.5 marks a possible outlier",
  },
  "johnson-kotz-balakrishnan-1994": {
    author: "N. L. Johnson, S. Kotz, N. Balakrishnan",
    title: "Continuous Univariate Distributions, Volume 1",
    publication: "Wiley, 2nd edition, 1994",
    locator: "ch. 13 Normal distributions (mean deviation σ√(2/π); quartiles at ±0.6745σ)",
  },
  "huber-1964": {
    author: "P. J. Huber",
    title: "Robust estimation of a location parameter",
    publication: "Annals of Mathematical Statistics 35(1), 1964, pp. 73–101",
    locator: "the ψ function ψ(u) = max(−c, min(c, u))",
  },
  "holland-welsch-1977": {
    author: "P. W. Holland, R. E. Welsch",
    title: "Robust regression using iteratively reweighted least-squares",
    publication: "Communications in Statistics – Theory and Methods 6(9), 1977, pp. 813–827",
    locator: "IRLS for M-estimators; Huber weights w = min(1, c/|u|); c = 1.345 for 95 % efficiency at the normal",
  },
  "anscombe-1973": {
    author: "F. J. Anscombe",
    title: "Graphs in statistical analysis",
    publication: "The American Statistician 27(1), 1973, pp. 17–21",
    locator: "the four data sets with the same fitted line y = 3 + 0.5x",
  },
  "rfc-4180": {
    author: "Y. Shafranovich",
    title: "Common Format and MIME Type for Comma-Separated Values (CSV) Files",
    publication: "IETF RFC 4180, 2005",
    locator: "§2 definition of the CSV format (optional header line, fields in double quotes)",
  },
} as const satisfies Record<string, Source>;
