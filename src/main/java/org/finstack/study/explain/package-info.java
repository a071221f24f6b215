/**
 * Why a coil performs as it does, in words a service manager can read: the sensitivity of
 * capacity and air pressure drop to a stated step in each input (tornado data), and sentences
 * built only from a rating's resistance shares, those sensitivities and a comparison's results.
 * Deterministic: the same inputs give the same sentences; every number in them is one computed.
 */
package org.finstack.study.explain;
