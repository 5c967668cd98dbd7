/**
 * The usual safety cautions shown with brake, steering and suspension parts. Wording is ours; the rules are the
 * trade's common practice (no published source) and defer to local codes and a qualified mechanic.
 */
export interface Caution {
  code: string;
  text: string;
}

const DEFER: Caution = {
  code: 'qualified_inspection',
  text: 'Have a qualified mechanic inspect the work before the vehicle goes on the road, and follow local codes and the vehicle\'s own manual.',
};

export function cautionsFor(part: { safetyClass: string; category: string }): Caution[] {
  const out: Caution[] = [];
  if (part.safetyClass === 'brake') {
    out.push({ code: 'brake_safety', text: 'Brakes stop the vehicle: a mistake here can injure or kill. If in doubt, leave the work to a licensed mechanic.' });
    if (['brake_hose', 'wheel_cylinder', 'master_cylinder', 'cylinder_kit', 'boot', 'seal'].includes(part.category)) {
      out.push({ code: 'rubber_ages', text: 'Hydraulic brake rubber (hoses, cups, boots) ages even unused. Old rubber is for display or authenticity only; fit new rubber for use.' });
    }
    if (part.category === 'brake_line' || part.category === 'brake_fitting') {
      out.push({ code: 'double_flare', text: 'Steel brake lines are double flared; a replacement line must match the fitting type and thread.' });
    }
    if (part.category === 'sealing_washer') {
      out.push({ code: 'crush_washer', text: 'Copper sealing (crush) washers are replaced, not reused.' });
    }
    out.push({ code: 'fluid', text: 'Do not mix silicone (DOT 5) and glycol brake fluids; flush fully when changing type. Brake fluid damages paint and is harmful: wear gloves and eye protection.' });
  }
  if (part.safetyClass === 'steering') {
    out.push({ code: 'steering_safety', text: 'Steering parts keep the vehicle under control: replace worn joints and fasteners, use new cotter pins, and have the work inspected.' });
  }
  if (part.safetyClass === 'suspension') {
    out.push({ code: 'spring_energy', text: 'Springs store energy: use the right compressor or support, and never work under a raised vehicle without jack stands.' });
  }
  if (part.safetyClass !== 'none') {
    out.push({ code: 'jack_stands', text: 'Support a raised vehicle on jack stands on firm ground; never rely on a jack alone.' });
    out.push(DEFER);
  }
  return out;
}
