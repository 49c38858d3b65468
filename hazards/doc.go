// Package hazards is Ullage's assessment engine. Given a Design — a sealed
// glass vessel, its fill of volatile liquid, the glass, the temperatures it
// will meet and the room it may break in — Assess computes the vessel's
// state (two-phase, liquid-full, all vapour or supercritical) at any
// temperature, the stresses in each part of the glass and the glass's
// strength after load-duration and size effects, the burst and implosion
// safety factors, the failure probability over the service life, the energy
// released by a rupture, the concentration of vapour in the room after a
// breakage against the published exposure limits and the lower
// flammability limit, and one finding per review criterion.
//
// All inputs and results are SI (K, Pa, kg, m³, J, s) unless a field name
// says otherwise. The package never imports GUI or PDF code.
package hazards
