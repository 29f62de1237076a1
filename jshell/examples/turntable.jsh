// A cup carried at 1.2 m from the axis of a turntable spinning up (invented test hall).
var hall = ReferenceFrame.inertialRoot("hall");
var table = hall.attach("turntable", Motions.spinUp(Vector3D.PLUS_K, 0.0, 0.5, 0.25));
var cup = PointState.of(new Vector3D(1.2, 0, 0), new Vector3D(0, 0.3, 0));
var terms = table.placementIn(hall, 4.0).fictitious(cup);
System.out.println(terms);
System.out.println(table.stateAt(4.0, cup).in(hall));
/exit
