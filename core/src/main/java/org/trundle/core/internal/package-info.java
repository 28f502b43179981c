/**
 * Internal helpers of the library modules (not part of the API): {@link org.trundle.core.internal.Checks},
 * the argument checks whose failures name the parameter and the value. The module exports this package
 * only to {@code org.trundle.surfaces}, {@code org.trundle.contact} and {@code org.trundle.kit}; code on the
 * class path can reach it but must not rely on it.
 */
package org.trundle.core.internal;
