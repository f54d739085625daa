# Independent hand working of AISC 360-16 F10 (ANSI/AISC 360-16,
# Specification for Structural Steel Buildings, AISC, Chicago, 2016;
# equations and the Commentary's beta_w formula recalled from memory) for
# sharp single angles: two rectangles, every integral by 2 x 2 Gauss points
# per rectangle (exact for the polynomials here), independent of the
# engine's Green's-theorem sums over the outline. Units: in, kip, ksi;
# moments printed in kNm. Used by tests/validation/aisc_chapter_f_angles.rs
# and tests/validation/aisc_h2.rs. Run: python3 f10_angles.py
import math
IN=25.4; KSI=6.894757; KIPIN=4.4482216*0.0254  # kip*in -> kNm
E=29000.0; FY=50.0
def props(h,b,t):
    rects=[(0,b,0,t),(0,t,t,h)]
    A=sum((y1-y0)*(z1-z0) for y0,y1,z0,z1 in rects)
    yc=sum((y1-y0)*(z1-z0)*(y0+y1)/2 for y0,y1,z0,z1 in rects)/A
    zc=sum((y1-y0)*(z1-z0)*(z0+z1)/2 for y0,y1,z0,z1 in rects)/A
    g=[(-1/math.sqrt(3)),(1/math.sqrt(3))]
    def integ(f):
        tot=0
        for y0,y1,z0,z1 in rects:
            for a in g:
                for c in g:
                    y=(y0+y1)/2+a*(y1-y0)/2; z=(z0+z1)/2+c*(z1-z0)/2
                    tot+=f(y,z)*(y1-y0)*(z1-z0)/4
        return tot
    Iy=integ(lambda y,z:(z-zc)**2); Iz=integ(lambda y,z:(y-yc)**2); Iyz=integ(lambda y,z:(y-yc)*(z-zc))
    th=0.5*math.atan2(-2*Iyz,Iy-Iz); s,c=math.sin(th),math.cos(th)
    uv=lambda y,z:((y-yc)*c+(z-zc)*s, -(y-yc)*s+(z-zc)*c)
    Iw=integ(lambda y,z:uv(y,z)[1]**2); Izz=integ(lambda y,z:uv(y,z)[0]**2)
    W=integ(lambda y,z:uv(y,z)[1]*(uv(y,z)[0]**2+uv(y,z)[1]**2))
    v0=uv(t/2,t/2)[1]
    bw=W/Iw-2*v0
    pts=dict(heel=uv(0,0),toe_h=[uv(0,h),uv(t,h)],toe_b=[uv(b,0),uv(b,t)],root=uv(t,t))
    # elastic moduli: farthest vertex of the outline (sharp): vertices
    verts=[(0,0),(b,0),(b,t),(t,t),(t,h),(0,h)]
    Sw=Iw/max(abs(uv(*p)[1]) for p in verts); Sz=Izz/max(abs(uv(*p)[0]) for p in verts)
    return dict(A=A,Iw=Iw,Iz=Izz,rz=math.sqrt(Izz/A),bw=bw,th=th,pts=pts,Sw=Sw,Sz=Sz,h=h,b=b,t=t,uv=uv)
def llb(bt,sc):
    r=math.sqrt(E/FY)
    if bt<=0.54*r: return 1.5*FY*sc
    if bt<=0.91*r: return FY*sc*(2.43-1.72*bt/r)
    return 0.71*E/bt**2*sc
def mcr(p,cb,lb,bw):
    k=4.4*bw*p['rz']/(lb*p['t'])
    return 9*E*p['A']*p['rz']*p['t']*cb/(8*lb)*(math.sqrt(1+k*k)+k)
def ltb(my,mc):
    return min((1.92-1.17*math.sqrt(my/mc))*my,1.5*my) if my<=mc else (0.92-0.17*mc/my)*mc
def side(p,axis,positive,lt=None):
    # lt = (cb, lb, long_compressed_somewhere)
    sign=1 if positive else -1
    idx=1 if axis=='major' else 0
    I=p['Iw'] if axis=='major' else p['Iz']
    S=p['Sw'] if axis=='major' else p['Sz']
    my=FY*S; mn=1.5*my; out={'My':my}
    for leg,toe in ((p['h'],p['pts']['toe_h']),(p['b'],p['pts']['toe_b'])):
        far=max(sign*q[idx] for q in toe)
        if far<=0: continue
        l=llb(leg/p['t'],I/far); out['llb_%g'%leg]=l; mn=min(mn,l)
    if lt:
        cb,lb,longc=lt
        short=(p['h']<p['b']) if positive else (p['b']<p['h'])
        bwabs=abs(p['bw']) if p['h']!=p['b'] else 0
        bw=bwabs if (short and not longc) else -bwabs
        m=mcr(p,cb,lb,bw); out['bw']=bw; out['Mcr']=m; out['ltb']=ltb(my,m); mn=min(mn,out['ltb'])
    out['Mn']=mn
    return out
def kNm(x): return x*KIPIN
if __name__=="__main__":
    p=props(6,4,.5)
    print("L6x4x1/2 beta_w %.4f in = %.3f mm, theta %.4f deg"%(p['bw'],p['bw']*IN,math.degrees(p['th'])))
    print(" Sw %.5f Sz %.5f in3, My_w %.4f kNm"%(p['Sw'],p['Sz'],kNm(FY*p['Sw'])))
    lb=10*12
    for pos in (True,False):
        o=side(p,'major',pos,(1.0,lb,False if not pos else True))
        print(" uniform moment, %s: beta_w %.4f in, Mcr %.4f kNm, ltb %.4f, Mn %.4f kNm, phiMn %.4f"%("+" if pos else "-",o['bw'],kNm(o['Mcr']),kNm(o['ltb']),kNm(o['Mn']),0.9*kNm(o['Mn'])), {k:round(kNm(v),4) for k,v in o.items() if k.startswith('llb')})
    # reversal: both negative beta_w; Cb from F1-1 for ma=10, mb=-5 (linear)
    ma,mb=10,-5
    M=lambda s: ma+(mb-ma)*s
    mmax=max(abs(ma),abs(mb)); cb=min(12.5*mmax/(2.5*mmax+3*abs(M(.25))+4*abs(M(.5))+3*abs(M(.75))),1.5)
    for pos in (True,False):
        o=side(p,'major',pos,(cb,lb,True))
        print(" reversing, Cb %.4f %s: beta_w %.4f Mcr %.4f Mn %.4f phiMn %.4f"%(cb,"+" if pos else "-",o['bw'],kNm(o['Mcr']),kNm(o['Mn']),0.9*kNm(o['Mn'])))
    q=props(4,6,.5)
    o=side(q,'major',True,(1.0,lb,False))
    print("L4(depth)x6(width)x1/2 +: beta_w %.4f Mcr %.4f Mn %.4f phiMn %.4f"%(o['bw'],kNm(o['Mcr']),kNm(o['Mn']),0.9*kNm(o['Mn'])))
    r=props(6,6,.3125)
    for pos in (True,False):
        o=side(r,'minor',pos)
        print("L6x6x5/16 minor %s: Mn %.4f phiMn %.4f"%("+" if pos else "-",kNm(o['Mn']),0.9*kNm(o['Mn'])), {k:round(kNm(v),4) for k,v in o.items() if k.startswith('llb')}, "1.5My %.4f"%kNm(1.5*o['My']))
    for h,b,t,table in ((8,4,.5,5.48),(5,3,.375,2.99),(6,4,.5,3.14)):
        print("L%gx%gx%g beta_w %.4f in (Commentary Table C-F10.1, recalled: %.2f)"%(h,b,t,props(h,b,t)['bw'],table))
    for pos in (True,False):
        o=side(p,'minor',pos); print("L6x4x1/2 minor %s: phiMn %.4f kNm"%("+" if pos else "-",0.9*kNm(o['Mn'])))
    for n,I in (('w',p['Iw']),('z',p['Iz'])):
        print("L6x4x1/2 P_e1%s at 10 ft: %.3f kN"%(n,math.pi**2*E*I/120.0**2*4.4482216))
    print("points L6x4x1/2 (u,v) in:", {k:v for k,v in p['pts'].items()})
