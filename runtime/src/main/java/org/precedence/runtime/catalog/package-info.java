/**
 * The shipped catalog of small proven dice sets.
 *
 * <p>Promise: {@link org.precedence.runtime.catalog.Catalog#shipped()} returns only entries whose
 * faces hash to the SHA-256 recorded beside them (loading fails loudly otherwise) and whose
 * grade and subset depth were computed by the exact analysis when the catalog was generated
 * (and are re-verified by the test suite). The resource is written only by {@link
 * org.precedence.runtime.catalog.CatalogGenerator}, from the search, never by hand.
 */
package org.precedence.runtime.catalog;
