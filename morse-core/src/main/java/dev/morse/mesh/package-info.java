/**
 * Polygon meshes: Wavefront OBJ and OFF readers, and the face poset of a mesh as a regular CW
 * complex (vertices, edges, polygons).
 */
package dev.morse.mesh;
