/**
 * A thin wrapper around quantlib.js (`@quantlib/ql`, a port of QuantLib) that prices an American
 * vanilla option on a binomial tree, so the engine can be compared with it at the same step count.
 * Time to expiry is `days / 365` on an Actual/365 (Fixed) day count, so callers pass whole days and
 * give the engine the same horizon.
 */
import {
  Actual365Fixed,
  AmericanExercise,
  BinomialVanillaEngine,
  BlackConstantVol,
  BlackScholesMertonProcess,
  CoxRossRubinstein,
  DateExt,
  FlatForward,
  Handle,
  NullCalendar,
  JarrowRudd,
  Option,
  PlainVanillaPayoff,
  Settings,
  SimpleQuote,
  Tian,
  TimeUnit,
  Trigeorgis,
  VanillaOption,
  type YieldTermStructure,
} from '@quantlib/ql';

export type QuantLibTree = 'crr' | 'jarrow-rudd' | 'tian' | 'trigeorgis';

export interface AmericanQuote {
  kind: 'call' | 'put';
  spot: number;
  strike: number;
  rate: number;
  dividendYield: number;
  volatility: number;
  days: number;
  steps: number;
  tree: QuantLibTree;
}

const treeClass = {
  crr: CoxRossRubinstein,
  'jarrow-rudd': JarrowRudd,
  tian: Tian,
  trigeorgis: Trigeorgis,
} as const;

export function quantlibAmerican(q: AmericanQuote): number {
  const today = DateExt.UTC('1,January,2024');
  Settings.evaluationDate.set(today);
  const dayCount = new Actual365Fixed();
  const maturity = DateExt.advance(today, q.days, TimeUnit.Days);
  const type = q.kind === 'call' ? Option.Type.Call : Option.Type.Put;
  const option = new VanillaOption(new PlainVanillaPayoff(type, q.strike), new AmericanExercise().aeInit1(today, maturity));
  const riskFree = new FlatForward().ffInit2(today, q.rate, dayCount);
  const dividends = new FlatForward().ffInit2(today, q.dividendYield, dayCount);
  const vol = new BlackConstantVol().bcvInit1(today, new NullCalendar(), q.volatility, dayCount);
  const process = new BlackScholesMertonProcess(
    new Handle(new SimpleQuote(q.spot)),
    // quantlib.js's typings disagree with themselves on FlatForward; the object is a curve.
    new Handle(dividends as unknown as YieldTermStructure),
    new Handle(riskFree as unknown as YieldTermStructure),
    new Handle(vol),
  );
  const engine = new BinomialVanillaEngine(new treeClass[q.tree]()).bveInit(process, q.steps);
  option.setPricingEngine(engine);
  return option.NPV();
}
