/**
 * Property tests are deterministic: one fixed seed for every fast-check run
 * (override with FAST_CHECK_SEED to explore), and the seed is printed with
 * any counterexample so a failure can be replayed exactly.
 */
import fc from 'fast-check';

const seed = Number(process.env.FAST_CHECK_SEED ?? 20_240_601);
fc.configureGlobal({ seed, verbose: 1 });
