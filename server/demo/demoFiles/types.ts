// What every demo file generator hands back: the bytes, the name they are filed under and the type
// the upload rules will sniff from them.
export type DemoFile = { fileName: string; contentType: 'application/pdf' | 'image/jpeg' | 'image/png'; bytes: Buffer };

export type SitePhotoSubject =
  | 'deck_pour'
  | 'roughened_joint'
  | 'bulkhead_with_dowels'
  | 'strip_seal_installed'
  | 'finger_joint'
  | 'rebar_mat'
  | 'slab_edge_cracks'
  | 'retarder_delivery_ticket';
