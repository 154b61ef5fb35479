/**
 * What sits inside the domain and what is counted there: solid blocks (their faces walls), the flow sections whose
 * mass flow is counted, and the flow report that says what the flow numbers refer to.
 */
import { z } from 'zod';
import { DUCT_KINDS } from './caseConstants';
import { wallSchema } from './boundarySchema';
import { coordinate, identifier, positive } from './schemaFields';

/**
 * A solid block: an axis-aligned rectangle inside the domain (in an axisymmetric domain, a ring or a disc around the
 * axis). Each face is a wall: `wall` for all of them, `faces.NAME` to give one face its own temperature, speed or
 * model. Its faces report as walls named BLOCK.left, BLOCK.right, BLOCK.bottom, BLOCK.top.
 */
export const blockSchema = z.strictObject({
  name: identifier('block name'),
  xMinM: coordinate('block xMinM'),
  xMaxM: coordinate('block xMaxM'),
  yMinM: coordinate('block yMinM'),
  yMaxM: coordinate('block yMaxM'),
  wall: wallSchema,
  faces: z
    .strictObject({
      left: wallSchema.optional(),
      right: wallSchema.optional(),
      bottom: wallSchema.optional(),
      top: wallSchema.optional(),
    })
    .optional(),
});

/** A cross-section x = xM (from yMinM to yMaxM, by default the whole height) through which the mass flow is counted. */
export const flowSectionSchema = z.strictObject({
  name: identifier('flow section name'),
  xM: coordinate('flow section xM'),
  yMinM: coordinate('flow section yMinM').optional(),
  yMaxM: coordinate('flow section yMaxM').optional(),
});

/**
 * What the flow numbers refer to: the duct's kind and size (gap H of a channel or slit, radius R of a tube or
 * orifice), its length for the reduced flow rate of long ducts, and the pressures the conductance and the
 * transmission probability are based on (by default those of the reservoirs on the left and right sides).
 */
export const flowReportSchema = z.strictObject({
  duct: z.enum(DUCT_KINDS, { error: `flowReport.duct must be one of ${DUCT_KINDS.join(', ')}` }),
  sizeM: positive('duct size (m: gap of a channel or slit, radius of a tube or orifice)'),
  lengthM: positive('duct length (m)').optional(),
  upstreamPressurePa: positive('upstream pressure (Pa)').optional(),
  downstreamPressurePa: z.number().finite().min(0, { error: 'downstream pressure must be 0 or more (Pa)' }).optional(),
  section: identifier('flowReport.section').optional(),
});
