/**
 * Implementation details shared between packages; not exported, may change at any time.
 */
package org.advecta.internal;
