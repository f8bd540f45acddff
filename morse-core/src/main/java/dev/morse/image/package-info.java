/**
 * Binary images and volumes: reading 2D images (Netpbm, PNG and the other formats of javax.imageio)
 * and 3D volumes (slice stacks, raw bytes), thresholding them into a set of voxels, and the cubical
 * complex of that set.
 */
package dev.morse.image;
