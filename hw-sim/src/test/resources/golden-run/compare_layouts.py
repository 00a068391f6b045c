#!/usr/bin/env python3
"""How GoldenRunTest's values were checked: compares the packets of two frame streams of the pinned run,
before (spectrum layout 1) and after (layout 2) the instrument description (telemetry ICD §1-§5).
Usage: python3 compare_layouts.py BEFORE.bin AFTER.bin   (frames as GoldenRunTest writes them with -Dgolden.dir)
"""
import struct
import sys
ASM = bytes.fromhex("1ACFFC1D")
L = 1024
def packets(data):
    vcs = {}
    i = 0
    while i < len(data):
        assert data[i:i+4] == ASM, i
        f = data[i+4:i+4+L]
        i += 4 + L
        vc = (f[1] >> 1) & 7
        fhp = ((f[4] & 7) << 8) | f[5]
        field = f[6:L-2]
        if vc == 7:
            continue
        buf = vcs.setdefault(vc, None)
        if buf is None:
            if fhp == 0x7FF or fhp == 0x7FE:
                continue
            vcs[vc] = bytearray(field[fhp:])
        else:
            buf.extend(field)
    out = []
    for vc, buf in sorted(vcs.items()):
        p = 0
        while p + 6 <= len(buf):
            apid = ((buf[p] & 7) << 8) | buf[p+1]
            seq = ((buf[p+2] & 0x3F) << 8) | buf[p+3]
            n = ((buf[p+4] << 8) | buf[p+5]) + 7
            if p + n > len(buf):
                break
            out.append((vc, apid, seq, bytes(buf[p:p+n])))
            p += n
    return out
a = [p for p in packets(open(sys.argv[1], "rb").read()) if p[1] != 0x7FF]
b = [p for p in packets(open(sys.argv[2], "rb").read()) if p[1] != 0x7FF]
assert len(a) == len(b), (len(a), len(b))
UD = 12                                     # primary header 6 + CUC 6
spectra_before = 0
last_diff = [0]
hk_diffs = []
diffs = {"spectrum": 0, "hk-counter": 0, "other": 0, "same": 0}
for (va, apa, sa, pa), (vb, apb, sb, pb) in zip(a, b):
    assert (va, apa, sa) == (vb, apb, sb)
    if apa in (0x100, 0x101):
        assert pb[UD] == 0x82 and struct.unpack(">H", pb[UD+1:UD+3])[0] == 1 and pb[UD+3] == 16, pb[:16].hex()
        stripped = bytearray(pb[:UD] + pb[UD+4:])
        struct.pack_into(">H", stripped, 4, struct.unpack(">H", pb[4:6])[0] - 4)
        assert bytes(stripped) == pa, "spectrum %d differs beyond the layout-2 header" % sa
        diffs["spectrum"] += 1
        spectra_before += 1
    elif pa == pb:
        diffs["same"] += 1
    else:
        assert apa == 0x110, hex(apa)
        ta = struct.unpack(">I", pa[UD+22:UD+26])[0]; tb = struct.unpack(">I", pb[UD+22:UD+26])[0]
        # packets are listed per VC, so count against the spectra of the whole run: the difference is 4
        # octets per spectrum generated before this packet, never decreasing, all of them at the last one
        assert (tb - ta) % 4 == 0 and 0 <= tb - ta <= 4 * spectra_before and tb - ta >= last_diff[0], (tb - ta,)
        last_diff[0] = tb - ta
        hk_diffs.append((tb - ta) // 4)
        assert pa[:UD+22] == pb[:UD+22] and pa[UD+26:] == pb[UD+26:]
        diffs["hk-counter"] += 1
assert hk_diffs[-1] == spectra_before, (hk_diffs, spectra_before)
print(len(a), "packets:", diffs, "housekeeping TM-octet counter differs by 4 x", hk_diffs, "spectra")
