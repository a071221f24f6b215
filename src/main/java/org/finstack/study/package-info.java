/** What users came for, built on the rating models: options, sweeps, fouling, diagnosis, cautions. */
package org.finstack.study;
