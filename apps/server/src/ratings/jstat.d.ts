/** The part of jStat (npm `jstat`, no types of its own) the tests use to check the ranking. */
declare module 'jstat' {
  const jStat: {
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
  };
  export default jStat;
}
