/**
 * Low-level DXF tokenizers: turn the bytes of an ASCII or binary DXF file into a stream of
 * (group code, value) pairs with their DXF line number or byte offset. Private to the importer.
 */
package org.linemass.importer.read;
