import { forecastRenewal } from './src/chronology/recurrence/forecast';
const intervals = [420, 610, 380, 550, 490, 600];
for (const model of ['POISSON','BPT','LOGNORMAL','WEIBULL'] as const) {
  const t = Date.now();
  const r = forecastRenewal({ model, intervalsYears: intervals, openIntervalYears: 300, windowsYears: [50], draws: 20000, seed: 5 });
  console.log(model, Date.now()-t, 'ms', JSON.stringify(r.meanRecurrence), JSON.stringify(r.aperiodicity), JSON.stringify(r.probabilities[0].range), r.approximateDraws);
}
