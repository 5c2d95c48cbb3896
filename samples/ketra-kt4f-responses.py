"""Writes the frequency responses of the Ketra KT-4F, an invented fly-by-wire variant of the
demo's Ketra KT-4 (not a real type), for samples/ketra-kt4f.yaml:
  ketra-kt4f-q.csv, ketra-kt4f-nz.csv (pitch stick force Fes [N] to q [deg/s] and nz [g]),
  ketra-kt4f-p.csv (roll stick force Fas [N] to p [deg/s]).
The high-order system at 2000 m, 95 m/s: the KT-4 short-period airframe (w, q) with a
pitch-rate command law (stick prefilter 1/(0.06 s + 1), command gain 0.045 rad/s per N,
proportional q feedback 0.05 rad per rad/s), a second-order elevator actuator (25 rad/s,
zeta 0.7) and a 30 ms computational delay; roll: roll-rate command (prefilter
1/(0.2 s + 1), p feedback), aileron actuator 1/(s/30 + 1), the same delay. Frequencies 0.05
to 20 rad/s, 30 points per decade, as a frequency sweep on a simulator would give them.
Run: python3 ketra-kt4f-responses.py
"""
import numpy as np
import control as ct

V, G = 95.0, 9.80665
Zw, Mw, Mwdot, Mq, Zde, Mde = -2.05, -0.088, -0.0058, -2.55, -9.5, -24.0
DELAY = 0.030

# airframe short term: states w [m/s], q [rad/s]; input elevator [rad]
A = [[Zw, V], [Mw + Mwdot * Zw, Mq + Mwdot * V]]
B = [[Zde], [Mde + Mwdot * Zde]]
airframe = ct.ss(A, B, [[0, 1], [-Zw / G, 0]], [[0], [-Zde / G]])  # outputs q, nz = -(Zw w + Zde de)/g [g]
actuator = ct.tf([625], [1, 35, 625])
prefilter = ct.tf([1], [0.06, 1])
# q error -> elevator: proportional, the sign making a positive error pitch the nose up (Mde < 0)
controller = ct.tf([-0.05], [1])
plant = airframe * actuator
# closed loop from q command to (q, nz): u = C (q_c - q)
Pq = ct.ss2tf(plant)[0, 0]
Pn = ct.ss2tf(plant)[1, 0]
Cq = controller
q_over_qc = ct.minreal(Pq * Cq / (1 + Pq * Cq), verbose=False)
nz_over_qc = ct.minreal(Pn * Cq / (1 + Pq * Cq), verbose=False)
K_STICK = 0.045  # rad/s of commanded q per N of stick force
q_tf = K_STICK * prefilter * q_over_qc
nz_tf = K_STICK * prefilter * nz_over_qc

# roll: p/delta_a = 28/(s + 7.4) (KT-4 roll mode), rate feedback 0.35, command gain 0.05 rad/s per N
p_air = ct.tf([28], [1, 7.4]) * ct.tf([1], [1 / 30, 1])
p_loop = ct.minreal(0.35 * p_air / (1 + 0.35 * p_air), verbose=False)
p_tf = 0.05 * ct.tf([1], [0.2, 1]) * p_loop

w = np.logspace(np.log10(0.05), np.log10(20), 3 * 30 + 1)
def write(name, tf, scale):
    h = np.array([tf(1j * x) for x in w]) * np.exp(-1j * w * DELAY) * scale
    gain = 20 * np.log10(np.abs(h))
    phase = np.degrees(np.unwrap(np.angle(h)))
    with open(name, 'w') as f:
        f.write('omega_rad_s,gain_db,phase_deg\n')
        for row in zip(w, gain, phase):
            f.write('%.6g,%.5f,%.4f\n' % row)
write('ketra-kt4f-q.csv', q_tf, np.degrees(1))   # deg/s per N
write('ketra-kt4f-nz.csv', nz_tf, 1.0)           # g per N
write('ketra-kt4f-p.csv', p_tf, np.degrees(1))   # deg/s per N
print('poles q/Fes', np.sort_complex(ct.poles(q_tf)))
